import {
  type AuditEntry,
  auditActionLabels,
  auditEntityLabels,
  labelOf,
} from '@upstroke/contracts';
import { csvLines } from '../../common/csv';

/**
 * Columns of the audit export: [header, how to read it from an entry]. Headers are words;
 * the action and what it was about are in the words of the label table (the action's code
 * is kept beside it for filtering); times are ISO 8601 in UTC, as the header says.
 */
const columns: [string, (e: AuditEntry) => unknown][] = [
  ['Time (ISO 8601 UTC)', (e) => e.at],
  ['User e-mail', (e) => e.userEmail],
  ['User name', (e) => e.userName],
  ['Action', (e) => labelOf(auditActionLabels, e.action)],
  ['Action code', (e) => e.action],
  ['About', (e) => labelOf(auditEntityLabels, e.entity)],
  ['About id', (e) => e.entityId],
  ['Record id', (e) => e.resuscitationId],
  ['Device id', (e) => e.deviceId],
  ['Details (JSON)', (e) => e.details],
];

/** The audit log as CSV, by the one CSV writer (formula cells neutralised). */
export function auditCsv(entries: AuditEntry[]): string {
  return csvLines([
    columns.map(([h]) => h),
    ...entries.map((e) => columns.map(([, read]) => read(e))),
  ]);
}
