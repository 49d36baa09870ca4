import { describe, expect, it } from 'vitest';
import { recordSummarySchema } from '@upstroke/contracts';
import { analyze } from './analyze.js';
import { summarize } from './summary.js';
import { at, compressionEvents, ev, record } from './testing/records.js';

describe('summarize', () => {
  const input = record(
    [
      ev('arrest', 0, { witnessed: true, monitored: false }),
      ev('rhythm', 30, { rhythm: 'vf' }),
      ...compressionEvents(10, 400, [[100, 125]]),
      ev('shock', 122, { energyJ: 200 }),
      ev('drug', 200, { drug: 'epinephrine' }),
      ev('rosc', 400, {}),
      ev('end', 400 + 25 * 60, { reason: 'transferred' }),
    ],
    {
      etco2: [8, 12, 25, 22].map((v, i) => ({
        at: at(60 + i * 60),
        value: v,
        unit: 'mmHg' as const,
        source: 'manual' as const,
      })),
    },
  );

  it('gives the Utstein-style core elements and EtCO2 process measures', () => {
    const s = recordSummarySchema.parse(summarize(input, analyze(input)));
    expect(s).toMatchObject({
      witnessed: true,
      monitored: false,
      firstRhythm: 'vf',
      shockableFirstRhythm: true,
    });
    expect([s.timeToCprSec, s.timeToFirstShockSec, s.timeToFirstEpinephrineSec]).toEqual([
      10, 122, 200,
    ]);
    // Utstein (Nolan 2019, from memory): sustained ROSC = ≥ 20 min without compressions
    expect([s.anyRosc, s.sustainedRosc]).toEqual([true, true]);
    expect(s.compressionFraction).toBeCloseTo((390 - 25) / 400, 10);
    expect(s.longestPauseSec).toBe(25);
    expect(s.preshockPausesOverThreshold).toBe(1); // 22 s to the shock > 10 s (Cheskes 2011)
    expect(s.etco2Documented).toBe(true);
    // values during compressions: 8, 25, 22 (the 12 at 120 s falls in the pause)
    expect(s.medianEtco2MmHg).toBe(22);
    expect(s.findingCounts['preshock-pause-long']).toBe(1);
    expect(s.durationSec).toBe(400 + 25 * 60);
  });

  it('lets the closing details fill what the events cannot tell', () => {
    const short = record([
      ev('arrest', 0, {}),
      ...compressionEvents(0, 100),
      ev('rosc', 100, {}),
      ev('end', 300, { reason: 'transferred' }),
    ]);
    const s = summarize(short, analyze(short), { witnessed: false, firstRhythm: 'pea' });
    expect([s.witnessed, s.monitored, s.firstRhythm, s.shockableFirstRhythm]).toEqual([
      false,
      null,
      'pea',
      false,
    ]);
    expect([s.anyRosc, s.sustainedRosc, s.etco2Documented]).toEqual([true, false, false]);
    expect(summarize(short, analyze(short), { sustainedRosc: true }).sustainedRosc).toBe(true);
  });
});
