import type { AuditEntry } from '@upstroke/contracts';
import { csvLines } from '../../common/csv';

const columns: (keyof AuditEntry)[] = [
  'at',
  'userEmail',
  'userName',
  'action',
  'entity',
  'entityId',
  'resuscitationId',
  'deviceId',
  'details',
];

/** The audit log as CSV, by the one CSV writer (formula cells neutralised). */
export function auditCsv(entries: AuditEntry[]): string {
  return csvLines([columns, ...entries.map((e) => columns.map((c) => e[c]))]);
}
