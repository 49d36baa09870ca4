import type { Band, Marker } from './timeline-model';

/** A marker kept at this zoom, and the label row (0 = top) its code is drawn in. */
export interface PlacedMarker {
  marker: Marker;
  row: number;
}

export interface ThinningOptions {
  /** Width of the plot area in CSS pixels. */
  widthPx: number;
  /** Label rows along the top of the chart. */
  rows?: number;
  /** Least distance between two labels in the same row (a code's label is ~28 px wide). */
  minGapPx?: number;
  /** The marker picked in the event table: always kept. */
  keep?: string | null;
}

/** Which events keep their marker first when there is no room for all (lower is first). */
const rankOf: Record<string, number> = {
  arrest: 0,
  shock: 0,
  rosc: 0,
  rearrest: 0,
  end: 0,
  drug: 1,
  rhythm: 1,
  airway: 2,
  access: 2,
  pulse: 2,
  ventilation: 3,
  note: 3,
  correction: 3,
};
const rank = (m: Marker) => rankOf[m.kind] ?? 4;

/**
 * Thins the markers for the view so that no two labels in a row come closer than
 * `minGapPx`: the events in the view are placed in order of importance (then time), each in
 * the first row with room, and any left without room are dropped at this zoom (the event
 * table lists every event; zooming in brings them back). Pure: tested without a canvas.
 */
export function thinMarkers(
  markers: readonly Marker[],
  view: Band,
  { widthPx, rows = 3, minGapPx = 32, keep = null }: ThinningOptions,
): PlacedMarker[] {
  const span = Math.max(1e-9, view.endSec - view.startSec);
  const xOf = (m: Marker) => ((m.tSec - view.startSec) / span) * widthPx;
  const inView = markers.filter((m) => m.tSec >= view.startSec && m.tSec <= view.endSec);
  const order = [...inView].sort(
    (a, b) => Number(b.id === keep) - Number(a.id === keep) || rank(a) - rank(b) || a.tSec - b.tSec,
  );
  const taken: number[][] = Array.from({ length: rows }, () => []);
  const placed: PlacedMarker[] = [];
  for (const m of order) {
    const x = xOf(m);
    const row = taken.findIndex((xs) => xs.every((other) => Math.abs(other - x) >= minGapPx));
    if (row === -1) continue;
    taken[row].push(x);
    placed.push({ marker: m, row });
  }
  return placed.sort((a, b) => a.marker.tSec - b.marker.tSec);
}
