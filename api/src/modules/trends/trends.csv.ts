import {
  ageGroupLabels,
  endReasonLabels,
  etco2InUnit,
  findingKindLabels,
  findingKindSchema,
  formatEtco2Both,
  labelOf,
  outcomeLabels,
  reviewStatusLabels,
  rhythmLabels,
  roundTo,
  type UtsteinSummary,
  yesNo,
} from '@upstroke/contracts';
import { csvLine } from '../../common/csv';

type Row = Record<string, unknown>;
const num = (v: unknown) =>
  typeof v === 'number' ? v : v === null || v === undefined ? null : Number(v);
/** Seconds to the whole second, mmHg to 0.1, shares as percent to 0.1 (their precision). */
const seconds = (v: unknown) => roundTo(num(v), 0);
const mmHg = (v: unknown) => roundTo(num(v), 1);
/** Records span sites in either unit: the median is given in both (1 kPa = 7.50062 mmHg). */
const kPa = (v: unknown) => {
  const n = num(v);
  return n === null ? null : roundTo(etco2InUnit(n, 'kPa'), 2);
};
const percent = (v: unknown) => {
  const n = num(v);
  return n === null ? null : roundTo(n * 100, 1);
};
const yesNoOf = (v: unknown) => (typeof v === 'boolean' ? yesNo(v) : '');
const word = (table: Readonly<Record<string, string>>) => (v: unknown) =>
  typeof v === 'string' ? labelOf(table, v) : '';

/**
 * Columns of the records export: [header, how to read it from a records-table row]. Headers
 * are words with their unit; coded values are written in the words of the label table.
 */
const baseColumns: [string, (r: Row) => unknown][] = [
  ['Record id', (r) => r.resuscitationId],
  ['Site', (r) => r.siteName],
  ['Unit', (r) => r.unitName],
  ['Arrest time (ISO 8601 UTC)', (r) => r.arrestAt],
  ['Age group', (r) => word(ageGroupLabels)(r.ageGroup)],
  ['Witnessed', (r) => yesNoOf(r.witnessed)],
  ['Monitored', (r) => yesNoOf(r.monitored)],
  ['First rhythm', (r) => word(rhythmLabels)(r.firstRhythm)],
  ['Shockable first rhythm', (r) => yesNoOf(r.shockable)],
  ['Outcome', (r) => word(outcomeLabels)(r.outcome)],
  ['End reason', (r) => word(endReasonLabels)(r.endReason)],
  ['Any ROSC', (r) => yesNoOf(r.anyRosc)],
  ['Sustained ROSC', (r) => yesNoOf(r.sustainedRosc)],
  ['Compression fraction (%)', (r) => percent(r.compressionFraction)],
  ['Longest pause (s)', (r) => seconds(r.longestPauseSec)],
  ['Pre-shock pauses over the limit (count)', (r) => r.preshockLongCount],
  ['Time to first compressions (s)', (r) => seconds(r.timeToFirstCompressionSec)],
  ['Time to first shock (s)', (r) => seconds(r.timeToFirstShockSec)],
  ['Time to first epinephrine (s)', (r) => seconds(r.timeToFirstEpinephrineSec)],
  ['EtCO2 documented', (r) => yesNoOf(r.etco2Documented)],
  ['Median EtCO2 during CPR (mmHg)', (r) => mmHg(r.medianEtco2)],
  ['Median EtCO2 during CPR (kPa)', (r) => kPa(r.medianEtco2)],
  [`CPR time with EtCO2 ≥ ${formatEtco2Both(10)} (%)`, (r) => percent(r.fractionGe10)],
  [`CPR time with EtCO2 ≥ ${formatEtco2Both(20)} (%)`, (r) => percent(r.fractionGe20)],
  ['Duration (s)', (r) => seconds(r.durationSec)],
  ['Protocol profile version', (r) => r.profileVersion],
  ['Review', (r) => labelOf(reviewStatusLabels, (r.reviewStatus as string | null) ?? 'awaiting')],
];

const findingColumns: [string, (r: Row) => unknown][] = findingKindSchema.options.map((kind) => [
  `Findings: ${findingKindLabels[kind]} (count)`,
  (r) => (r.findingCounts as Record<string, number> | null)?.[kind] ?? 0,
]);

export const recordCsvColumns = [...baseColumns, ...findingColumns];

export const recordCsvHeader = () => csvLine(recordCsvColumns.map(([h]) => h));
export const recordCsvLine = (row: Record<string, unknown>) =>
  csvLine(recordCsvColumns.map(([, read]) => read(row)));

/** The Utstein summary as CSV: one line per element, then the medians. */
export function utsteinCsv(s: UtsteinSummary): string {
  const period = ['Period from (ISO 8601)', 'Period to (ISO 8601; not included)'];
  let out = csvLine(['Element', 'Count', 'Of (treated arrests)', 'Share (%)', ...period]);
  for (const l of s.lines)
    out += csvLine([l.label, l.count, l.denominator, l.percent, s.from, s.to]);
  out += csvLine(['Measure', 'Median', 'Records (n)', '', ...period]);
  for (const m of s.medians)
    out += csvLine([medianLabel(m), medianValue(m), m.n, '', s.from, s.to]);
  return out;
}

type Median = UtsteinSummary['medians'][number];
/** Compression fraction is a share: written in percent like every other share here. */
const medianLabel = (m: Median) => (m.key === 'compressionFraction' ? `${m.label} (%)` : m.label);
const medianValue = (m: Median) =>
  m.key === 'compressionFraction'
    ? percent(m.value)
    : roundTo(m.value, m.key === 'medianEtco2' ? 1 : 0);
