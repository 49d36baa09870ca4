import { eventsInForce } from '@upstroke/capno';
import { describe, expect, it } from 'vitest';
import type { LocalEvent } from '../../../lib/offline';
import { arrestCorrection } from './arrest-time';
import { atSec, ev } from './test-events';

let n = 0;
const stored = (corrections: ReturnType<typeof arrestCorrection>['corrections']) =>
  corrections.map((data): LocalEvent => ev('correction', 600 + (n += 1), data));

describe('arrestCorrection', () => {
  it('supersedes the Start tap arrest with one N min earlier, with the reason', () => {
    const start = ev('arrest', 0);
    const { corrections, arrestAt } = arrestCorrection([start], start, 4, 'Collapse seen');
    expect(arrestAt).toBe(atSec(-240));
    expect(corrections).toEqual([
      {
        supersedes: start.id,
        reason: 'Collapse seen',
        replacement: { kind: 'arrest', data: {}, at: atSec(-240) },
      },
    ]);
    const inForce = eventsInForce([start, ...stored(corrections)]);
    expect(inForce.map((e) => [e.kind, e.at])).toEqual([['arrest', atSec(-240)]]);
  });

  it('set again: the earlier change is withdrawn and one arrest stands, at the new time', () => {
    const start = ev('arrest', 0);
    const first = [start, ...stored(arrestCorrection([start], start, 4, 'first').corrections)];
    const second = arrestCorrection(first, start, 7, 'better estimate');
    expect(second.arrestAt).toBe(atSec(-420));
    const all = [...first, ...stored(second.corrections)];
    expect(eventsInForce(all).map((e) => [e.kind, e.at])).toEqual([['arrest', atSec(-420)]]);
  });
});
