import { eventsInForce } from '@upstroke/capno';
import { describe, expect, it } from 'vitest';
import type { LocalEvent } from '../../../lib/offline';
import { arrestAtInForce, arrestCorrection } from './arrest-time';
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

describe('arrestAtInForce', () => {
  it('follows a correction of the arrest, from this tablet or another, and nothing else', () => {
    const start = ev('arrest', 0);
    // The record's own time differs from the Start tap's entry: only a correction moves it.
    const recordAt = atSec(5);
    expect(arrestAtInForce([start, ev('compressions-start', 10)], recordAt)).toBe(recordAt);
    const moved = [start, ...stored(arrestCorrection([start], start, 3, 'seen').corrections)];
    expect(arrestAtInForce(moved, recordAt)).toBe(atSec(-180));
    // Undone (the correction itself superseded): back to the Start tap's arrest.
    const undone = [...moved, ev('correction', 700, { supersedes: moved[1].id })];
    expect(arrestAtInForce(undone, recordAt)).toBe(atSec(0));
    expect(arrestAtInForce([], recordAt)).toBe(recordAt);
  });
});
