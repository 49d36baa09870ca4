import type { AnnotationOptions } from 'chartjs-plugin-annotation';
import { type ChartColours, chartColours } from '../../../config/chart-colours';
import type { PlacedMarker } from './marker-thinning';
import type { Band, Marker, TimelineModel } from './timeline-model';

/** The marker in focus, shared with the event table (hover or tap on either side). */
export interface MarkerLink {
  active: string | null;
  onActive: (id: string | null) => void;
}

function markerColour(e: Marker): string {
  if (e.kind === 'shock') return '#8a5a00';
  if (e.kind === 'rosc') return '#2e7d32';
  return '#455a64';
}

/**
 * One line per event kept at this zoom, its code along the top in the row it was given (see
 * thinMarkers), so that close events stay readable. Hovering or tapping the code shows the
 * event in words (its tooltip) and picks its row in the event table.
 */
function markerAnnotation(
  { marker: e, row }: PlacedMarker,
  link: MarkerLink,
  c: ChartColours,
): AnnotationOptions {
  const on = link.active === e.id;
  return {
    type: 'line',
    xMin: e.tSec,
    xMax: e.tSec,
    borderColor: on ? '#0b5c8a' : e.amendment ? '#9a5b00' : c.markerLine,
    borderWidth: on ? 3 : 1,
    hitTolerance: 8,
    z: on ? 10 : 0,
    enter: () => link.onActive(e.id),
    click: () => link.onActive(e.id),
    label: {
      display: true,
      content: on ? [e.code, e.label] : e.code,
      position: 'end',
      yAdjust: row * 20,
      backgroundColor: on ? '#0b5c8a' : markerColour(e),
      font: { size: on ? 12 : 11 },
      padding: 3,
      z: on ? 10 : 0,
    },
  };
}

/** Shaded bands, the low threshold, rises and one labelled line per event kept. */
export function annotationsOf(
  m: TimelineModel,
  highlight: Band | null,
  yMax: number,
  link: MarkerLink = { active: null, onActive: () => undefined },
  placed: readonly PlacedMarker[] = m.markers.map((marker, i) => ({ marker, row: i % 3 })),
  c: ChartColours = chartColours.light,
): Record<string, AnnotationOptions> {
  const out: Record<string, AnnotationOptions> = {};
  m.compressions.forEach((b, i) => {
    out[`cpr${i}`] = {
      type: 'box',
      xMin: b.startSec,
      xMax: b.endSec,
      backgroundColor: c.compressions,
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  m.low.forEach((l, i) => {
    out[`low${i}`] = {
      type: 'box',
      xMin: l.startSec,
      xMax: l.endSec,
      backgroundColor: c.lowBand,
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  m.rosc.forEach((r, i) => {
    out[`rosc${i}`] = {
      type: 'box',
      xMin: r.startSec,
      xMax: r.endSec,
      backgroundColor: c.rosc,
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
      label: {
        display: true,
        content: 'ROSC',
        position: { x: 'start', y: 'start' },
        color: c.roscText,
      },
    };
  });
  m.gaps.forEach((g, i) => {
    out[`gap${i}`] = {
      type: 'box',
      xMin: g.startSec,
      xMax: g.endSec,
      backgroundColor: c.gap,
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  out.lowLine = {
    type: 'line',
    yMin: m.lowLine,
    yMax: m.lowLine,
    borderColor: c.lowLine,
    borderWidth: 1,
    borderDash: [4, 4],
  };
  m.rises.forEach((r, i) => {
    out[`rise${i}`] = {
      type: 'line',
      xMin: r.tSec,
      xMax: r.tSec,
      borderColor: '#1f6fb2',
      borderWidth: 3,
      borderDash: r.confounded ? [8, 6] : undefined,
      label: { display: true, content: r.label, position: 'center', backgroundColor: '#1f6fb2' },
    };
  });
  placed.forEach((p, i) => {
    out[`ev${i}`] = markerAnnotation(p, link, c);
  });
  if (highlight) {
    out.focus = {
      type: 'box',
      xMin: highlight.startSec,
      xMax: highlight.endSec,
      yMin: 0,
      yMax,
      backgroundColor: c.focusFill,
      borderColor: c.focusLine,
      borderWidth: 2,
    };
  }
  return out;
}
