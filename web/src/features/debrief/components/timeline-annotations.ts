import type { AnnotationOptions } from 'chartjs-plugin-annotation';
import type { Band, TimelineModel } from './timeline-model';

/** Shaded bands, the low threshold, rises and one labelled line per event. */
export function annotationsOf(
  m: TimelineModel,
  highlight: Band | null,
  yMax: number,
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
  // Rows of labels so that close events stay readable.
  m.markers.forEach((e, i) => {
    out[`ev${i}`] = {
      type: 'line',
      xMin: e.tSec,
      xMax: e.tSec,
      borderColor: e.amendment ? '#9a5b00' : 'rgba(60, 60, 60, 0.45)',
      borderWidth: 1,
      label: {
        display: true,
        content: e.code,
        // Labels along the top, in three rows so that close events stay readable.
        position: 'end',
        yAdjust: (i % 3) * 20,
        backgroundColor: e.code === 'S' ? '#b7791f' : e.code === 'ROSC' ? '#2e7d32' : '#455a64',
        font: { size: 11 },
        padding: 3,
      },
    };
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
