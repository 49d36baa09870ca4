import type { Chart, Plugin } from 'chart.js';
import { useCallback, useMemo, useState } from 'react';
import type { Band } from './timeline-model';

/**
 * The span the timeline shows — zoomed or panned by hand, else a finding's view, else the
 * whole code — and the plot's width in pixels, which decide how many markers fit. Held in
 * React state, so a redraw (a marker picked) keeps the zoom instead of resetting it.
 */
export function useShownRange(view: Band | null, durationSec: number) {
  const [byHand, setByHand] = useState<Band | null>(null);
  const [lastView, setLastView] = useState(view);
  const [widthPx, setWidthPx] = useState(600);
  // A finding chosen (or the whole code asked for) replaces any zoom by hand.
  if (view !== lastView) {
    setLastView(view);
    setByHand(null);
  }
  const fromChart = useCallback(({ chart }: { chart: Chart }) => {
    const x = chart.scales.x;
    if (x) setByHand({ startSec: x.min, endSec: x.max });
  }, []);
  const widthPlugin = useMemo<Plugin<'scatter'>>(
    () => ({
      id: 'upstrokePlotWidth',
      afterLayout: (chart) => setWidthPx(Math.round(chart.chartArea.width)),
    }),
    [],
  );
  const shown = byHand ?? view ?? { startSec: 0, endSec: durationSec };
  return { shown, widthPx, fromChart, widthPlugin, reset: () => setByHand(null) };
}
