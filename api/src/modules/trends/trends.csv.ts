import { findingKindSchema, type UtsteinSummary } from '@upstroke/contracts';
import { csvLine } from '../../common/csv';

/** Columns of the records export: [header, how to read it from a records-table row]. */
const baseColumns: [string, (r: Record<string, unknown>) => unknown][] = [
  ['resuscitation_id', (r) => r.resuscitationId],
  ['site', (r) => r.siteName],
  ['unit', (r) => r.unitName],
  ['arrest_at', (r) => r.arrestAt],
  ['age_group', (r) => r.ageGroup],
  ['witnessed', (r) => r.witnessed],
  ['monitored', (r) => r.monitored],
  ['first_rhythm', (r) => r.firstRhythm],
  ['shockable', (r) => r.shockable],
  ['outcome', (r) => r.outcome],
  ['end_reason', (r) => r.endReason],
  ['any_rosc', (r) => r.anyRosc],
  ['sustained_rosc', (r) => r.sustainedRosc],
  ['compression_fraction', (r) => r.compressionFraction],
  ['longest_pause_sec', (r) => r.longestPauseSec],
  ['preshock_pauses_over_limit', (r) => r.preshockLongCount],
  ['time_to_first_compression_sec', (r) => r.timeToFirstCompressionSec],
  ['time_to_first_shock_sec', (r) => r.timeToFirstShockSec],
  ['time_to_first_epinephrine_sec', (r) => r.timeToFirstEpinephrineSec],
  ['etco2_documented', (r) => r.etco2Documented],
  ['median_etco2_mmhg', (r) => r.medianEtco2],
  ['fraction_etco2_ge_10', (r) => r.fractionGe10],
  ['fraction_etco2_ge_20', (r) => r.fractionGe20],
  ['duration_sec', (r) => r.durationSec],
  ['profile_version', (r) => r.profileVersion],
  ['review_status', (r) => r.reviewStatus],
];

const findingColumns: [string, (r: Record<string, unknown>) => unknown][] =
  findingKindSchema.options.map((kind) => [
    `findings_${kind.replace(/-/g, '_')}`,
    (r) => (r.findingCounts as Record<string, number> | null)?.[kind] ?? 0,
  ]);

export const recordCsvColumns = [...baseColumns, ...findingColumns];

export const recordCsvHeader = () => csvLine(recordCsvColumns.map(([h]) => h));
export const recordCsvLine = (row: Record<string, unknown>) =>
  csvLine(recordCsvColumns.map(([, read]) => read(row)));

/** The Utstein summary as CSV: one line per element, then the medians. */
export function utsteinCsv(s: UtsteinSummary): string {
  let out = csvLine(['element', 'count', 'denominator', 'percent', 'period_from', 'period_to']);
  for (const l of s.lines)
    out += csvLine([l.label, l.count, l.denominator, l.percent, s.from, s.to]);
  out += csvLine(['measure', 'median', 'n', '', 'period_from', 'period_to']);
  for (const m of s.medians) out += csvLine([m.label, m.value, m.n, '', s.from, s.to]);
  return out;
}
