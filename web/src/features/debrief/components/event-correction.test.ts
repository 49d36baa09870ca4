import { describe, expect, it } from 'vitest';
import { type EventFix, fixProblem, secondsFromClock } from './event-correction';

const arrestAt = '2026-03-04T10:00:00.000Z';
const fix = (clock: string, data: Record<string, unknown>): EventFix => {
  const sec = secondsFromClock(clock) ?? 0;
  return {
    eventId: 'd',
    clock,
    data,
    at: new Date(Date.parse(arrestAt) + sec * 1000).toISOString(),
  };
};
const epi = (dose: number) => ({ drug: 'epinephrine', dose, unit: 'mg', route: 'iv' });

describe('correcting an event in an amendment', () => {
  it('reads times as the Debrief writes them, from the arrest', () => {
    expect(secondsFromClock('3:20')).toBe(200);
    expect(secondsFromClock('1:02:03')).toBe(3723);
    expect(secondsFromClock('-0:10')).toBe(-10);
    expect(secondsFromClock('3:7')).toBeNull();
    expect(secondsFromClock('soon')).toBeNull();
  });

  it('keeps a time within 1 h before and 24 h after the arrest (plausibility bounds)', () => {
    expect(fixProblem(fix('2:20', epi(1)), arrestAt)).toBeNull();
    expect(fixProblem(fix('-61:00', epi(1)), arrestAt)).toBe(
      'Time: more than 1 h before the arrest',
    );
    expect(fixProblem(fix('24:00:01', epi(1)), arrestAt)).toBe(
      'Time: more than 24 h after the arrest',
    );
    expect(fixProblem({ ...fix('2:20', epi(1)), clock: '2 min' }, arrestAt)).toMatch(/^Time: /);
  });

  it("refuses a dose above the drug's plausible range or not above zero", () => {
    // Epinephrine: 1 mg per dose in adult arrest (AHA 2020); about ten times that is a slip.
    expect(fixProblem(fix('2:20', epi(0.5)), arrestAt)).toBeNull();
    expect(fixProblem(fix('2:20', epi(100)), arrestAt)).toBe(
      'Dose: above the plausible epinephrine dose of 10 mg',
    );
    expect(fixProblem(fix('2:20', epi(0)), arrestAt)).toBe('Dose: must be above zero');
  });
});
