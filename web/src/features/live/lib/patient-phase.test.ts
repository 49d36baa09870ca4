import { describe, expect, it } from 'vitest';
import { patientPhase, phaseSpans, roscPeriods } from './patient-phase';
import { ev, T0 } from './test-events';

describe('patient phase', () => {
  it('"Pulse present" starts ROSC like the ROSC button; "No pulse" alone does not', () => {
    expect(patientPhase([ev('pulse', 60, { present: false })]).phase).toBe('pulseless');
    expect(patientPhase([ev('pulse', 60, { present: true })])).toEqual({
      phase: 'rosc',
      since: T0 + 60_000,
    });
  });

  it('a second ROSC tap during ROSC changes nothing; a re-arrest before any ROSC neither', () => {
    const spans = phaseSpans([
      ev('rearrest', 30),
      ev('rosc', 60),
      ev('rosc', 90),
      ev('rearrest', 120),
      ev('rosc', 400),
    ]);
    expect(spans.map((s) => s.phase)).toEqual(['pulseless', 'rosc', 'pulseless', 'rosc']);
    expect(roscPeriods(spans, T0 + 500_000)).toEqual([
      { fromMs: T0 + 60_000, toMs: T0 + 120_000 },
      { fromMs: T0 + 400_000, toMs: T0 + 500_000 },
    ]);
  });

  it('nothing after the end changes the state', () => {
    const spans = phaseSpans([ev('end', 60, { reason: 'terminated' }), ev('rosc', 90)]);
    expect(spans.at(-1)).toEqual({ phase: 'ended', since: T0 + 60_000 });
  });
});
