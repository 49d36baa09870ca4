import { describe, expect, it } from 'vitest';
import { thinMarkers } from './marker-thinning';
import type { Marker } from './timeline-model';

const marker = (id: string, tSec: number, kind = 'note'): Marker => ({
  id,
  tSec,
  kind,
  code: id,
  label: id,
  amendment: false,
});

/** Least pixel distance between two labels drawn in the same row. */
function closestInRow(
  placed: ReturnType<typeof thinMarkers>,
  view: { startSec: number; endSec: number },
  widthPx: number,
) {
  let least = Infinity;
  for (const a of placed)
    for (const b of placed)
      if (a !== b && a.row === b.row) {
        const px =
          (Math.abs(a.marker.tSec - b.marker.tSec) / (view.endSec - view.startSec)) * widthPx;
        least = Math.min(least, px);
      }
  return least;
}

describe('thinMarkers', () => {
  // Sixty events in one minute: a busy stretch of a code.
  const busy = Array.from({ length: 60 }, (_, i) =>
    marker(`n${i}`, 60 + i, i === 30 ? 'shock' : 'note'),
  );

  it('keeps every marker when there is room for all', () => {
    const few = [marker('a', 0), marker('b', 300), marker('c', 600)];
    const placed = thinMarkers(few, { startSec: 0, endSec: 600 }, { widthPx: 900 });
    expect(placed.map((p) => p.marker.id)).toEqual(['a', 'b', 'c']);
    expect(placed.every((p) => p.row === 0)).toBe(true);
  });

  it('never lets two labels in a row come closer than the gap, on a phone-wide whole view', () => {
    const view = { startSec: 0, endSec: 1800 };
    const placed = thinMarkers(busy, view, { widthPx: 320, minGapPx: 32 });
    expect(placed.length).toBeLessThan(busy.length);
    expect(placed.length).toBeGreaterThan(0);
    expect(closestInRow(placed, view, 320)).toBeGreaterThanOrEqual(32);
    expect(new Set(placed.map((p) => p.row)).size).toBeLessThanOrEqual(3);
  });

  it('gives markers back as the view zooms in', () => {
    const wide = thinMarkers(busy, { startSec: 0, endSec: 1800 }, { widthPx: 320 });
    const near = thinMarkers(busy, { startSec: 55, endSec: 125 }, { widthPx: 320 });
    const close = thinMarkers(busy, { startSec: 80, endSec: 90 }, { widthPx: 320 });
    expect(near.length).toBeGreaterThan(wide.length);
    // Ten seconds over 320 px: 32 px a second, room for every event in the view.
    expect(close.map((p) => p.marker.id)).toEqual(
      busy.filter((m) => m.tSec >= 80 && m.tSec <= 90).map((m) => m.id),
    );
  });

  it('keeps the shock before notes, and the picked marker whatever its kind', () => {
    const view = { startSec: 0, endSec: 1800 };
    const ids = thinMarkers(busy, view, { widthPx: 320, keep: 'n31' }).map((p) => p.marker.id);
    expect(ids).toContain('n30');
    expect(ids).toContain('n31');
  });

  it('drops markers outside the view', () => {
    const placed = thinMarkers(busy, { startSec: 100, endSec: 200 }, { widthPx: 900 });
    expect(placed.every((p) => p.marker.tSec >= 100)).toBe(true);
  });
});
