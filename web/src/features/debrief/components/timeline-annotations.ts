import type { AnnotationOptions } from 'chartjs-plugin-annotation';
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
 * One line per event with its code along the top, in three rows so that close events stay
 * readable. Hovering or tapping the code shows the event in words (its tooltip) and picks
 * its row in the event table.
 */
function markerAnnotation(e: Marker, i: number, link: MarkerLink): AnnotationOptions {
  const on = link.active === e.id;
  return {
    type: 'line',
    xMin: e.tSec,
    xMax: e.tSec,
    borderColor: on ? '#0b5c8a' : e.amendment ? '#9a5b00' : 'rgba(60, 60, 60, 0.45)',
    borderWidth: on ? 3 : 1,
    hitTolerance: 8,
    z: on ? 10 : 0,
    enter: () => link.onActive(e.id),
    click: () => link.onActive(e.id),
    label: {
      display: true,
      content: on ? [e.code, e.label] : e.code,
      position: 'end',
      yAdjust: (i % 3) * 20,
      backgroundColor: on ? '#0b5c8a' : markerColour(e),
      font: { size: on ? 12 : 11 },
      padding: 3,
      z: on ? 10 : 0,
    },
  };
}

/** Shaded bands, the low threshold, rises and one labelled line per event. */
export function annotationsOf(
  m: TimelineModel,
  highlight: Band | null,
  yMax: number,
  link: MarkerLink = { active: null, onActive: () => undefined },
): Record<string, AnnotationOptions> {
  const out: Record<string, AnnotationOptions> = {};
  m.compressions.forEach((c, i) => {
    out[`cpr${i}`] = {
      type: 'box',
      xMin: c.startSec,
      xMax: c.endSec,
      backgroundColor: 'rgba(76, 160, 96, 0.12)',
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  m.low.forEach((l, i) => {
    out[`low${i}`] = {
      type: 'box',
      xMin: l.startSec,
      xMax: l.endSec,
      backgroundColor: 'rgba(200, 60, 50, 0.22)',
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  m.rosc.forEach((r, i) => {
    out[`rosc${i}`] = {
      type: 'box',
      xMin: r.startSec,
      xMax: r.endSec,
      backgroundColor: 'rgba(31, 111, 178, 0.12)',
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
      label: {
        display: true,
        content: 'ROSC',
        position: { x: 'start', y: 'start' },
        color: '#1f4e79',
      },
    };
  });
  m.gaps.forEach((g, i) => {
    out[`gap${i}`] = {
      type: 'box',
      xMin: g.startSec,
      xMax: g.endSec,
      backgroundColor: 'rgba(120, 130, 140, 0.18)',
      borderWidth: 0,
      drawTime: 'beforeDatasetsDraw',
    };
  });
  out.lowLine = {
    type: 'line',
    yMin: m.lowLine,
    yMax: m.lowLine,
    borderColor: '#c0392b',
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
  m.markers.forEach((e, i) => {
    out[`ev${i}`] = markerAnnotation(e, i, link);
  });
  if (highlight) {
    out.focus = {
      type: 'box',
      xMin: highlight.startSec,
      xMax: highlight.endSec,
      yMin: 0,
      yMax,
      backgroundColor: 'rgba(255, 193, 7, 0.12)',
      borderColor: '#f9a825',
      borderWidth: 2,
    };
  }
  return out;
}
