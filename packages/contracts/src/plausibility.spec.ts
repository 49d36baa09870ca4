import { describe, expect, it } from 'vitest';
import { eventSchema } from './events.js';
import {
  arrestTimeProblem,
  doseProblem,
  entryTimeProblem,
  jsonProblem,
  textProblem,
  yearProblem,
} from './plausibility.js';

describe('plausibility bounds', () => {
  it('finds NUL, unpaired surrogates and deep nesting, and lets real text through', () => {
    expect(textProblem('Bay 3 — défibrillation 😀')).toBeNull();
    expect(textProblem('a\u0000b')).toMatch(/NUL/);
    expect(textProblem('\ud800')).toMatch(/surrogate/);
    expect(textProblem('x\udc00')).toMatch(/surrogate/);
    expect(jsonProblem({ note: { text: ['ok', 'bad\u0000'] } })).toBe(
      'note.text.1: contains a NUL character',
    );
    expect(jsonProblem({ ['k\ud83d']: 1 })).toMatch(/key contains an unpaired surrogate/);
    let nested: unknown = 1;
    for (let i = 0; i < 20; i += 1) nested = [nested];
    expect(jsonProblem(nested)).toBeNull();
    expect(jsonProblem([nested])).toMatch(/nested deeper than 20/);
  });

  it('bounds times to the record: arrest − 1 h to arrest + 24 h', () => {
    const arrest = '2026-03-04T10:00:00Z';
    expect(entryTimeProblem('2026-03-04T09:00:00Z', arrest)).toBeNull();
    expect(entryTimeProblem('2026-03-04T08:59:59Z', arrest)).toMatch(/before/);
    expect(entryTimeProblem('2026-03-05T10:00:00Z', arrest)).toBeNull();
    expect(entryTimeProblem('2026-03-05T10:00:01Z', arrest)).toMatch(/after/);
    const now = Date.parse('2026-12-01T00:00:00Z');
    expect(arrestTimeProblem('2026-12-01T00:59:00Z', now)).toBeNull();
    expect(arrestTimeProblem('2026-12-01T01:01:00Z', now)).toMatch(/future/);
    expect(arrestTimeProblem('2016-12-02T00:00:00Z', now)).toBeNull();
    expect(arrestTimeProblem('2016-11-30T00:00:00Z', now)).toMatch(/10 years/);
    expect(yearProblem('0000-01-01T00:00:00Z')).toMatch(/1900/);
  });

  it('refuses a dose far above the usual adult dose of its drug, in its unit', () => {
    // Usual adult doses: epinephrine 1 mg (AHA 2020), amiodarone 300 mg (ERC 2021).
    expect(doseProblem('epinephrine', 1, 'mg')).toBeNull();
    expect(doseProblem('epinephrine', 1, 'g')).toMatch(/plausible epinephrine dose/);
    expect(doseProblem('amiodarone', 300, 'mg')).toBeNull();
    expect(doseProblem('amiodarone', 300, 'g')).not.toBeNull();
    const drug = (data: object) =>
      eventSchema.safeParse({
        id: '6f1c8a52-4f0e-4d4c-9b1e-0d7c3a1e2b90',
        resuscitationId: '7a2d9b63-5a1f-4e5d-8c2f-1e8d4b2f3ca1',
        at: '2026-03-04T10:00:00Z',
        kind: 'drug',
        data,
      });
    expect(drug({ drug: 'magnesium', dose: 2, unit: 'g' }).success).toBe(true);
    const slip = drug({ drug: 'epinephrine', dose: 10000, unit: 'g' });
    expect(slip.success).toBe(false);
    expect(slip.error?.issues[0].path).toEqual(['data', 'dose']);
  });
});
