import { composeDebrief } from '@upstroke/capno';
import type { CommitteeReportData, Debrief } from '@upstroke/contracts';
import {
  type CommitteeReportOptions,
  renderCommitteeReportPdf,
} from '../exports/pdf/committee-report-pdf';
import { renderReportPdf, type ReportOptions } from '../exports/pdf/report-pdf';

type ComposeArgs = Parameters<typeof composeDebrief>;

/**
 * The work that runs off the event loop: composing a debrief (the capnogram analysis) and
 * rendering the PDF reports. Each takes and returns plain data (structured clone).
 */
export const tasks = {
  compose: (stored: ComposeArgs[0], header: ComposeArgs[1]) => composeDebrief(stored, header),
  report: async (d: Debrief, opts: ReportOptions): Promise<Uint8Array> => {
    const file = await renderReportPdf(d, opts);
    return new Uint8Array(file.buffer, file.byteOffset, file.byteLength);
  },
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
