import type { AuditEntry } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { auditDetailsText, changeRows, otherDetails } from './audit-details';

const entry = (action: string, details: Record<string, unknown>): AuditEntry => ({
  id: 1,
  at: '2026-12-01T10:00:00.000Z',
  userId: null,
  userEmail: null,
  userName: null,
  action,
  entity: 'user',
  entityId: null,
  resuscitationId: null,
  deviceId: null,
  details,
});

describe('audit details', () => {
  it('reads a profile version as threshold label, before → after with unit and reason', () => {
    const e = entry('profile.create', {
      siteId: 's1',
      version: 2,
      changed: ['lowEtco2MmHg'],
      changes: { lowEtco2MmHg: { from: 10, to: 12, reason: 'Local audit' } },
    });
    expect(changeRows(e)).toEqual([
      { field: 'Low EtCO2', before: '10 mmHg', after: '12 mmHg', note: 'Local audit' },
    ]);
    expect(auditDetailsText(e)).toBe('Version 2. Low EtCO2: 10 mmHg → 12 mmHg');
  });

  it('names roles, yes/no and sites in a user change, leaving out the flat copies', () => {
    const e = entry('user.update', {
      role: 'quality',
      active: false,
      siteIds: ['a'],
      changes: {
        role: { from: 'lead', to: 'quality' },
        active: { from: true, to: false },
        siteIds: { from: ['a', 'b'], to: ['a'] },
      },
    });
    const names = (ids: string[]) => ids.map((i) => `Site ${i.toUpperCase()}`).join(', ');
    expect(changeRows(e, names).map((r) => `${r.field}: ${r.before} → ${r.after}`)).toEqual([
      'Role: Lead → Quality committee',
      'Active: Yes → No',
      'Sites: Site A, Site B → Site A',
    ]);
    expect(otherDetails(e, names)).toEqual([]);
  });

  it('words the details of an entry without changes (a failed sign-in, an export filter)', () => {
    expect(
      auditDetailsText(entry('sign-in.failed', { email: 'x@k.test', reason: 'wrong password' })),
    ).toBe('E-mail address: x@k.test; Reason: wrong password');
    expect(auditDetailsText(entry('export.csv', { filter: {} }))).toBe('Filter: none');
  });

  it("words each discarded entry: its kind, the server's reason and its content", () => {
    const details = {
      reason: 'Typed on the wrong code',
      recordOnServer: false,
      items: [{ id: 'e1', kind: 'events', refusal: 'at: late', content: '{"kind":"note"}' }],
    };
    expect(otherDetails(entry('discard-refused', details))).toEqual([
      ['Reason', 'Typed on the wrong code'],
      ['Record on the server', 'No'],
      ['Entries', `(1) Id: e1; Kind: events; Server's reason: at: late; Content: {"kind":"note"}`],
    ]);
  });
});
