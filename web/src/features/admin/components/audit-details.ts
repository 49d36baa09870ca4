import {
  type AuditEntry,
  labelOf,
  roleLabels,
  type Thresholds,
  thresholdFields,
} from '@upstroke/contracts';

/** One changed field of an audit entry, worded for a reader. */
export interface ChangeRow {
  field: string;
  before: string;
  after: string;
  note?: string;
}

/** Site ids → names, from the sites this admin can see. */
export type SiteNamer = (ids: string[]) => string;

const fieldLabels: Record<string, string> = {
  name: 'Name',
  role: 'Role',
  active: 'Active',
  siteIds: 'Sites',
  siteId: 'Site',
  etco2Unit: 'EtCO2 unit',
  paperSize: 'Paper size',
  locale: 'Language',
  timeZone: 'Time zone',
  clock: 'Clock',
  mailDomains: 'E-mail domains',
  email: 'E-mail address',
  reason: 'Reason',
  file: 'File',
  filter: 'Filter',
  rows: 'Rows',
  recipients: 'Number of recipients',
  to: 'Recipients',
  status: 'Status',
  version: 'Version',
  unitId: 'Unit id',
  from: 'From',
  items: 'Entries',
  id: 'Id',
  kind: 'Kind',
  refusal: "Server's reason",
  content: 'Content',
  recordOnServer: 'Record on the server',
};

/** "lowEtco2MmHg" → its threshold label; other keys from the table or split at capitals. */
export function fieldLabel(key: string): string {
  const threshold = thresholdFields[key as keyof Thresholds];
  if (threshold) return threshold.label;
  return fieldLabels[key] ?? key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
}

/** A stored value as words: booleans Yes/No, roles named, site ids as names, lists joined. */
export function valueText(key: string, value: unknown, sites?: SiteNamer): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (key === 'role' && typeof value === 'string') return labelOf(roleLabels, value);
  if ((key === 'siteIds' || key === 'siteId') && sites) {
    const ids = Array.isArray(value) ? (value as string[]) : [String(value)];
    return sites(ids) || ids.join(', ');
  }
  if (Array.isArray(value)) {
    if (value.length === 0) return '—';
    // A list of objects (a discard's entries): each one in words, one after another.
    const objects = value.some((v) => typeof v === 'object' && v !== null);
    return objects
      ? value.map((v, i) => `(${i + 1}) ${valueText(key, v, sites)}`).join(' ')
      : value.map(String).join(', ');
  }
  if (typeof value === 'object') {
    const parts = Object.entries(value as Record<string, unknown>).filter(
      ([, v]) => v !== undefined,
    );
    if (parts.length === 0) return 'none';
    return parts.map(([k, v]) => `${fieldLabel(k)}: ${valueText(k, v, sites)}`).join('; ');
  }
  const unit = thresholdFields[key as keyof Thresholds]?.unit;
  return unit ? `${String(value)} ${unit}` : String(value);
}

interface StoredChange {
  from?: unknown;
  to?: unknown;
  reason?: string;
}

function isChanges(v: unknown): v is Record<string, StoredChange> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Each before → after of an entry that stored its changes (profiles, users, sites). */
export function changeRows(entry: AuditEntry, sites?: SiteNamer): ChangeRow[] {
  const changes = entry.details.changes;
  if (!isChanges(changes)) return [];
  return Object.entries(changes).map(([key, c]) => ({
    field: fieldLabel(key),
    before: valueText(key, c.from, sites),
    after: valueText(key, c.to, sites),
    ...(c.reason ? { note: c.reason } : {}),
  }));
}

/** The details other than the changes (and their flat copies), as label → words. */
export function otherDetails(entry: AuditEntry, sites?: SiteNamer): [string, string][] {
  const changed = isChanges(entry.details.changes) ? Object.keys(entry.details.changes) : [];
  return Object.entries(entry.details)
    .filter(([k, v]) => k !== 'changes' && k !== 'changed' && !changed.includes(k) && v != null)
    .map(([k, v]) => [fieldLabel(k), valueText(k, v, sites)]);
}

/** The one-line summary in the log's Details column. */
export function auditDetailsText(entry: AuditEntry, sites?: SiteNamer): string {
  const rows = changeRows(entry, sites);
  if (isChanges(entry.details.changes)) {
    const version =
      typeof entry.details.version === 'number' ? `Version ${entry.details.version}. ` : '';
    const text = rows.map((r) => `${r.field}: ${r.before} → ${r.after}`).join('; ');
    return `${version}${text || 'No values changed'}`;
  }
  return otherDetails(entry, sites)
    .map(([k, v]) => `${k}: ${v}`)
    .join('; ');
}
