import { type Thresholds, thresholdFields } from '@upstroke/contracts';

interface Change {
  from: number | null;
  to: number;
  reason?: string;
}

function isChanges(v: unknown): v is Record<string, Change> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/**
 * The details column of the audit log. A profile version reads as its old → new values
 * ("Low EtCO2: 10 → 3 mmHg (reason: …)"); other entries as their JSON.
 */
export function auditDetailsText(action: string, details: Record<string, unknown>): string {
  const changes = details.changes;
  if (action !== 'profile.create' || !isChanges(changes)) return JSON.stringify(details);
  const parts = Object.entries(changes).map(([key, c]) => {
    const field = thresholdFields[key as keyof Thresholds];
    const unit = field?.unit ? ` ${field.unit}` : '';
    const reason = c.reason ? ` (reason: ${c.reason})` : '';
    return `${field?.label ?? key}: ${c.from ?? '—'} → ${c.to}${unit}${reason}`;
  });
  const version = typeof details.version === 'number' ? `Version ${details.version}. ` : '';
  return `${version}${parts.length ? parts.join('; ') : 'No values changed'}`;
}
