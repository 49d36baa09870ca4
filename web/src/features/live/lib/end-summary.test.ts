import { describe, expect, it } from 'vitest';
import { closingCandidate, endSummary } from './end-summary';
import { liveState } from './live-state';
import { ARREST, ev, T0 } from './test-events';

const state = (events: Parameters<typeof liveState>[0]) => liveState(events, ARREST);

describe('closingCandidate', () => {
  it('"ROSC at end of record" after 5 min of ROSC is not sustained: the outcome is left to the lead', () => {
    expect(
      closingCandidate('rosc-sustained', state([ev('rosc', 600)]), ARREST, T0 + 900_000),
    ).toEqual({
      status: 'closed',
      endReason: 'rosc-sustained',
      outcome: null,
    });
  });

  it('ROSC maintained 20 min is sustained (Utstein in-hospital, Nolan et al. 2019)', () => {
    const s = state([ev('rosc', 600)]);
    const twentyMin = T0 + 600_000 + 20 * 60_000;
    expect(closingCandidate('rosc-sustained', s, ARREST, twentyMin).outcome).toBe('rosc-sustained');
    expect(closingCandidate('rosc-sustained', s, ARREST, twentyMin - 1000).outcome).toBeNull();
  });

  it('stopped and transferred codes pre-fill their outcome', () => {
    expect(closingCandidate('terminated', state([]), ARREST, T0 + 1e6).outcome).toBe('died');
    expect(closingCandidate('transferred', state([]), ARREST, T0 + 1e6).outcome).toBe(
      'transferred',
    );
  });
});

describe('endSummary', () => {
  it('summarises an ended code; a running one has none', () => {
    const events = [
      ev('shock', 30, { energyJ: 200 }),
      ev('drug', 90, { drug: 'epinephrine' }),
      ev('rosc', 300),
      ev('rearrest', 420),
      ev('rosc', 600),
    ];
    expect(endSummary(state(events), ARREST)).toBeNull();
    const s = endSummary(state([...events, ev('end', 900, { reason: 'rosc-sustained' })]), ARREST);
    expect(s).toEqual({
      endedAtMs: T0 + 900_000,
      durationSec: 900,
      reason: 'ROSC at end of record',
      roscPeriods: [
        { fromMs: T0 + 300_000, toMs: T0 + 420_000 },
        { fromMs: T0 + 600_000, toMs: T0 + 900_000 },
      ],
      shocks: 1,
      epinephrineDoses: 1,
    });
  });
});
