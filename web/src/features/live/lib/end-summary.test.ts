import { describe, expect, it } from 'vitest';
import { closingCandidate, endSummary } from './end-summary';
import { liveState } from './live-state';
import { ev, T0 } from './test-events';

const inForce = (events: Parameters<typeof liveState>[0]) => liveState(events).inForce;

describe('closingCandidate', () => {
  it('"ROSC at end of record" is not sustained ROSC after 5 min: the outcome is left to the lead', () => {
    const events = inForce([ev('rosc', 600)]);
    expect(closingCandidate('rosc-sustained', events, T0 + 900_000)).toEqual({
      status: 'closed',
      endReason: 'rosc-sustained',
      outcome: null,
    });
  });

  it('ROSC maintained 20 min at the end is sustained (Utstein in-hospital, Nolan et al. 2019)', () => {
    const events = inForce([ev('rosc', 600)]);
    expect(closingCandidate('rosc-sustained', events, T0 + 600_000 + 20 * 60_000).outcome).toBe(
      'rosc-sustained',
    );
    expect(
      closingCandidate('rosc-sustained', events, T0 + 600_000 + 20 * 60_000 - 1000).outcome,
    ).toBeNull();
  });

  it('stopped and transferred codes pre-fill their outcome', () => {
    expect(closingCandidate('terminated', [], T0 + 1e6).outcome).toBe('died');
    expect(closingCandidate('transferred', [], T0 + 1e6).outcome).toBe('transferred');
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
    expect(endSummary(inForce(events), T0)).toBeNull();
    const s = endSummary(inForce([...events, ev('end', 900, { reason: 'rosc-sustained' })]), T0);
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
