import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { alignClocks } from './align-clocks.js';

// Recorded shocks (seconds on the record's clock): an invented code with three shocks.
const shocks = [125, 250, 371];

describe('alignClocks', () => {
  it('finds a monitor clock 97 s ahead from three shocks, within 1 s', () => {
    // File markers = record times + 97 s, with the few hundred ms of jitter that a
    // defibrillator's marker and a tap on a tablet typically differ by (from memory).
    const file = [125.4 + 97, 249.7 + 97, 371.2 + 97];
    const a = alignClocks(file, shocks);
    expect(a).not.toBeNull();
    expect(Math.abs((a?.offsetSec ?? 0) - 97)).toBeLessThan(1);
    expect(a?.matched).toBe(3);
    expect(a?.residualSec).toBeLessThan(0.5);
  });

  it('ignores a spurious file marker and a shock missing from the file', () => {
    const file = [250 - 42, 371 - 42, 30]; // clock 42 s behind, plus a stray marker
    const a = alignClocks(file, shocks);
    expect(a?.offsetSec).toBeCloseTo(-42, 6);
    expect(a?.matched).toBe(2);
    expect(a?.markers).toBe(3);
  });

  it('returns null without markers, without shocks or beyond the maximum offset', () => {
    expect(alignClocks([], shocks)).toBeNull();
    expect(alignClocks([100], [])).toBeNull();
    expect(alignClocks([100 + 86400], [100])).toBeNull();
  });

  it('recovers any offset when every recorded shock is in the file (property)', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 0, max: 3600 }), { minLength: 2, maxLength: 8 }),
        fc.double({ min: -3000, max: 3000, noNaN: true }),
        (times, offset) => {
          const sorted = [...times].sort((a, b) => a - b);
          // Shocks in a code are at least ~2 min apart; closer ones could alias (common practice).
          const spaced = sorted.map((t, i) => t + i * 120);
          const a = alignClocks(
            spaced.map((t) => t + offset),
            spaced,
          );
          expect(Math.abs((a?.offsetSec ?? Infinity) - offset)).toBeLessThan(0.01);
        },
      ),
      { numRuns: 50 },
    );
  });
});
