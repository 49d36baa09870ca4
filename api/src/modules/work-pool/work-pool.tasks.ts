import { composeDebrief } from '@upstroke/capno';
import type { CommitteeReportData, Debrief } from '@upstroke/contracts';
import {
  type CommitteeReportOptions,
  renderCommitteeReportPdf,
} from '../exports/pdf/committee-report-pdf';
import { renderReportPdf, type ReportOptions } from '../exports/pdf/report-pdf';

type ComposeArgs = Parameters<typeof composeDebrief>;
type Stored = ComposeArgs[0];
type Header = ComposeArgs[1];
/** User id → name, for "recorded by" (a Map does not cross threads as cheaply as pairs). */
type Names = readonly (readonly [string, string])[];

function composeNamed(stored: Stored, header: Header, names: Names) {
  const composed = composeDebrief(stored, header);
  const byId = new Map(names);
  for (const e of composed.debrief.events)
    e.recordedByName = e.recordedBy ? (byId.get(e.recordedBy) ?? null) : null;
  return composed;
}

async function pdfBytes(d: Debrief, opts: ReportOptions): Promise<Uint8Array> {
  const file = await renderReportPdf(d, opts);
  return new Uint8Array(file.buffer, file.byteOffset, file.byteLength);
}

/**
 * The work that runs off the event loop: composing a debrief (the capnogram analysis) and
 * rendering the PDF reports. Each takes and returns plain data (structured clone), and what
 * comes back is only what the caller uses: the event loop pays to receive every byte (a
 * capnogram's samples as numbers are megabytes to read back and collect).
 */
export const tasks = {
  /** The debrief alone (screen, e-mail): the capnogram's samples stay in the worker. */
  debrief: (stored: Stored, header: Header, names: Names): Debrief =>
    composeNamed(stored, header, names).debrief,
  /** The debrief with the capnogram's runs (the FHIR export carries them whole). */
  compose: (stored: Stored, header: Header, names: Names) => composeNamed(stored, header, names),
  /** Renders an already composed debrief (the e-mail attaches the one it summarises). */
  report: pdfBytes,
  /** Composes and renders in one task: only the file's bytes come back. */
  recordReport: (stored: Stored, header: Header, names: Names, opts: ReportOptions) =>
    pdfBytes(composeNamed(stored, header, names).debrief, opts),
  /** The committee's monthly report. */
  committeeReport: async (r: CommitteeReportData, opts: CommitteeReportOptions) => {
    const file = await renderCommitteeReportPdf(r, opts);
    return new Uint8Array(file.buffer, file.byteOffset, file.byteLength);
  },
};

export type Tasks = typeof tasks;
export type TaskName = keyof Tasks;

export interface TaskMessage<K extends TaskName = TaskName> {
  name: K;
  args: Parameters<Tasks[K]>;
}
