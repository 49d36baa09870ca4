import {
  findingKindSchema,
  type AnalysisInput,
  type AnalysisOutput,
  type FindingKind,
  type RecordSummary,
  type Rhythm,
  type SummaryClosingDetails,
} from '@upstroke/contracts';
import { firstOf, normalizeEvents } from './events/normalize.js';
import { resolveThresholds } from './profile.js';

const SHOCKABLE: readonly Rhythm[] = ['vf', 'pvt'];

function findingCounts(output: AnalysisOutput): Record<FindingKind, number> {
  const counts = Object.fromEntries(findingKindSchema.options.map((k) => [k, 0])) as Record<
    FindingKind,
    number
  >;
  for (const f of output.findings) counts[f.kind]++;
  return counts;
}

/**
 * The per-record audit row: Utstein-style core elements plus EtCO2 process measures.
 *
 * - `witnessed`/`monitored`: from the `arrest` event, unless the closing details say so;
 * - `firstRhythm`: the first `rhythm` event (closing details win); shockable = VF or pVT;
 * - `timeToCprSec`: time to first compressions;
 * - `anyRosc`: any documented ROSC period;
 * - `sustainedRosc`: the engine's Utstein sustained ROSC (a ROSC period of ≥ 20 min), never
 *   the End choice; only when the record cannot tell (it ends in a shorter ROSC) does the
 *   lead's attestation in the closing details count;
 * - `preshockPausesOverThreshold`: pre-shock parts longer than the profile's limit;
 * - `etco2Documented`: at least one EtCO2 value (entered, imported or from a breath).
 */
export function summarize(
  input: AnalysisInput,
  output: AnalysisOutput,
  closingDetails: SummaryClosingDetails = {},
): RecordSummary {
  const events = normalizeEvents(input.arrestAt, input.events);
  const arrest = firstOf(events, 'arrest');
  const firstRhythm =
    closingDetails.firstRhythm !== undefined
      ? closingDetails.firstRhythm
      : (firstOf(events, 'rhythm')?.data.rhythm ?? null);
  const m = output.measures;
  const endReason = firstOf(events, 'end')?.data.reason ?? null;
  const rosc = m.roscPeriods ?? [];
  const limit = resolveThresholds(input.profile).preshockPauseMaxSec;
  return {
    witnessed: closingDetails.witnessed ?? arrest?.data.witnessed ?? null,
    monitored: closingDetails.monitored ?? arrest?.data.monitored ?? null,
    firstRhythm,
    shockableFirstRhythm: firstRhythm === null ? null : SHOCKABLE.includes(firstRhythm),
    timeToCprSec: m.timeToFirstCompressionSec,
    timeToFirstShockSec: m.timeToFirstShockSec,
    timeToFirstEpinephrineSec: m.timeToFirstEpinephrineSec,
    anyRosc: rosc.length > 0,
    sustainedRosc: (m.sustainedRosc ?? closingDetails.sustainedRosc) === true,
    compressionFraction: m.compressionFraction,
    longestPauseSec: m.longestPauseSec,
    preshockPausesOverThreshold: m.pauses.filter((p) => (p.preShockSec ?? 0) > limit).length,
    etco2Documented: (input.etco2?.length ?? 0) > 0 || output.breaths.length > 0,
    medianEtco2MmHg: m.etco2.medianMmHg,
    fractionEtco2AtOrAbove10: m.etco2.fractionAtOrAbove10,
    fractionEtco2AtOrAbove20: m.etco2.fractionAtOrAbove20,
    findingCounts: findingCounts(output),
    durationSec: m.durationSec,
    endReason,
  };
}
