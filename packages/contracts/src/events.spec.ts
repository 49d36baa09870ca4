import { describe, expect, it } from 'vitest';
import { eventSchema } from './events.js';

const base = {
  id: '7b0c3f5e-2a4d-4c1e-9f8a-1b2c3d4e5f60',
  resuscitationId: '1b0c3f5e-2a4d-4c1e-9f8a-1b2c3d4e5f61',
  at: '2026-03-04T10:00:05Z',
};

describe('eventSchema', () => {
  it('accepts each kind with its own data', () => {
    expect(eventSchema.safeParse({ ...base, kind: 'shock', data: { energyJ: 200 } }).success).toBe(
      true,
    );
    expect(
      eventSchema.safeParse({
        ...base,
        kind: 'drug',
        data: { drug: 'epinephrine', dose: 1, unit: 'mg' },
      }).success,
    ).toBe(true);
  });

  it('names the field at fault when data does not fit the kind', () => {
    const r = eventSchema.safeParse({ ...base, kind: 'shock', data: { energyJ: 'lots' } });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['data', 'energyJ']);
  });

  it('refuses an unknown kind and a time without offset', () => {
    expect(eventSchema.safeParse({ ...base, kind: 'dance', data: {} }).success).toBe(false);
    expect(
      eventSchema.safeParse({ ...base, at: '2026-03-04T10:00:05', kind: 'rosc', data: {} }).success,
    ).toBe(false);
  });
});
