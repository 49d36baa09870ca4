import type { RecordSummaryRow } from '@upstroke/contracts';
import { summarize } from '../summary.js';
import { analyseStored, type StoredAnalysis } from './compose.js';
import type { StoredRecord } from './stored-record.js';

/**
 * The `record_summaries` row of a record, derived from the same analysis as its debrief
 * (`analyseStored`: same checks, same profile in force, same capnogram), with the closing
 * details the team entered taking precedence over what events imply. Pure: the API (on
 * sign and amend) and the demo generator both write rows through it.
 */
export function buildSummaryRow(
  record: StoredRecord,
  analysis: StoredAnalysis = analyseStored(record),
): RecordSummaryRow {
  const s = summarize(analysis.input, analysis.output, {
    witnessed: record.witnessed ?? undefined,
    monitored: record.monitored ?? undefined,
    firstRhythm: record.firstRhythm ?? undefined,
  });
  return {
    resuscitationId: record.id,
    siteId: record.siteId,
    unitId: record.unitId,
    arrestAt: new Date(record.arrestAt).toISOString(),
    ageGroup: record.ageGroup ?? null,
    firstRhythm: s.firstRhythm,
    shockable: s.shockableFirstRhythm,
    witnessed: s.witnessed,
    monitored: s.monitored,
    outcome: record.outcome ?? null,
    endReason: s.endReason,
    anyRosc: s.anyRosc,
    sustainedRosc: s.sustainedRosc,
    compressionFraction: s.compressionFraction,
    longestPauseSec: s.longestPauseSec,
    preshockLongCount: s.preshockPausesOverThreshold,
    timeToFirstCompressionSec: s.timeToCprSec,
    timeToFirstShockSec: s.timeToFirstShockSec,
    timeToFirstEpinephrineSec: s.timeToFirstEpinephrineSec,
    etco2Documented: s.etco2Documented,
    medianEtco2: s.medianEtco2MmHg,
    fractionGe10: s.fractionEtco2AtOrAbove10,
    fractionGe20: s.fractionEtco2AtOrAbove20,
    findingCounts: s.findingCounts,
    durationSec: s.durationSec,
    profileVersion: analysis.profile.version,
  };
}
