import { describe, expect, it } from 'vitest';
import { eventDetails, eventMarkerCodes, eventMarkerLegend } from './event-labels.js';

describe('event words', () => {
  it('names what a correction put in place of the entry, and why', () => {
    const replacement = {
      kind: 'drug',
      at: '2026-03-04T10:03:20Z',
      data: { drug: 'epinephrine', dose: 1, unit: 'mg', route: 'io' },
    };
    expect(eventDetails('correction', { supersedes: 'x', reason: 'Given IO', replacement })).toBe(
      'Replaced by Epinephrine 1 mg IO. Reason: Given IO',
    );
    expect(eventDetails('correction', { supersedes: 'x', reason: 'Tapped twice' })).toBe(
      'Tapped twice',
    );
  });

  it('gives every marker code one meaning, none a drug initial or a route', () => {
    const codes = eventMarkerLegend.map((l) => l.code);
    expect(new Set(codes).size).toBe(codes.length);
    for (const code of Object.values(eventMarkerCodes)) expect(codes).toContain(code);
    // Common practice: A/E read as adrenaline/epinephrine, CA as calcium, IV/IO as routes.
    for (const taken of ['A', 'E', 'CA', 'IV', 'IO', 'M', 'S', 'D'])
      expect(codes).not.toContain(taken);
  });
});
