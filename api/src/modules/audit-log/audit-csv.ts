import type { AuditEntry } from '@upstroke/contracts';

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

/**
 * One CSV cell (RFC 4180 quoting). Cells that a spreadsheet would run as a formula get a
 * leading apostrophe: device ids and details come from clients.
 */
export function csvCell(value: unknown): string {
  let text =
    value === null || value === undefined
      ? ''
      : typeof value === 'object'
        ? JSON.stringify(value)
        : String(value);
  if (/^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function auditCsv(entries: AuditEntry[]): string {
  const header = columns.join(',');
  const lines = entries.map((e) => columns.map((c) => csvCell(e[c])).join(','));
  return [header, ...lines].join('\r\n') + '\r\n';
}
