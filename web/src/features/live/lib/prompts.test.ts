import { thresholdDefaults } from '@upstroke/contracts';
import { describe, expect, it } from 'vitest';
import { liveState } from './live-state';
import { livePrompts, roscPrompt } from './prompts';
import { ARREST, ev, T0 } from './test-events';

const t = thresholdDefaults;
const at = (events: Parameters<typeof liveState>[0], sec: number) =>
  livePrompts({
    state: liveState(events, ARREST),
    second: T0 / 1000 + sec,
    arrestAtMs: T0,
    thresholds: t,
    engine: [],
  }).map((p) => p.key);

// Start, compressions, epinephrine, compressions off, then ROSC.
const arrest = [
  ev('compressions-start', 2),
  ev('drug', 60, { drug: 'epinephrine', dose: 1, unit: 'mg' }),
  ev('compressions-stop', 100),
];

describe('livePrompts', () => {
  it('while pulseless: hands off, rhythm check and epinephrine interval by the site settings', () => {
    // Site defaults: rhythm check every 2 min, epinephrine from 3 min (AHA 2020, summary).
    expect(at(arrest, 100 + t.pauseMaxSec + 1)).toEqual(['hands-off']);
    expect(at(arrest, t.rhythmCheckIntervalSec)).toContain('rhythm-due');
    expect(at(arrest, 60 + t.epinephrineMinSec)).toEqual(
      expect.arrayContaining(['hands-off', 'rhythm-due', 'epinephrine-due']),
    );
  });

  it('during ROSC: no arrest prompt at all, however long it lasts — only the calm ROSC line', () => {
    const rosc = [...arrest, ev('rosc', 110)];
    expect(at(rosc, 110 + 6 * 60)).toEqual([roscPrompt.key]);
    // The engine's findings in progress are not shown either.
    const withEngine = livePrompts({
      state: liveState(rosc, ARREST),
      second: T0 / 1000 + 500,
      arrestAtMs: T0,
      thresholds: t,
      engine: [{ key: 'etco2-low', text: 'low', severity: 'warning' }],
    });
    expect(withEngine).toEqual([roscPrompt]);
  });

  it('after a re-arrest the prompts come back, counted from the re-arrest', () => {
    const again = [...arrest, ev('rosc', 110), ev('rearrest', 800)];
    expect(at(again, 805)).toEqual(['epinephrine-due']);
    expect(at(again, 800 + t.pauseMaxSec + 1)).toContain('hands-off');
    expect(at(again, 800 + t.rhythmCheckIntervalSec)).toContain('rhythm-due');
  });

  it('after the end: nothing', () => {
    expect(at([...arrest, ev('end', 200, { reason: 'terminated' })], 900)).toEqual([]);
  });
});
