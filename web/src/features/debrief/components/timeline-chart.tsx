import { Box, Button, Stack, Typography } from '@mui/material';
import { clockFromArrest, etco2Heading } from '@upstroke/contracts';
import {
  Chart as ChartJS,
  type ChartData,
  type ChartOptions,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import annotationPlugin from 'chartjs-plugin-annotation';
import { useEffect, useMemo, useRef } from 'react';
import { Scatter } from 'react-chartjs-2';
import { useChartColours } from '../../../hooks/use-chart-colours';
import { MarkerLegend } from './marker-legend';
import { thinMarkers } from './marker-thinning';
import { annotationsOf, type MarkerLink } from './timeline-annotations';
import { type Band, roundTicks, type TimelineModel } from './timeline-model';
import { useShownRange } from './use-shown-range';

ChartJS.register(LinearScale, PointElement, LineElement, Tooltip, Legend, annotationPlugin);

/** chartjs-plugin-zoom touches `window` when imported: load it in the browser only. */
function useZoomPlugin(): void {
  useEffect(() => {
    if (typeof window === 'undefined') return;
    void import('chartjs-plugin-zoom').then((m) => ChartJS.register(m.default));
  }, []);
}

export interface TimelineProps extends MarkerLink {
  model: TimelineModel;
  view: Band | null;
  highlight: Band | null;
  onResetView: () => void;
}

/** EtCO2 over the code with every event, compressions, flagged intervals and rises. */
export function TimelineChart(props: TimelineProps) {
  const { model, view, highlight, onResetView } = props;
  useZoomPlugin();
  const ref = useRef<ChartJS<'scatter'>>(null);
  const c = useChartColours();
  const { shown, widthPx, fromChart, widthPlugin, reset } = useShownRange(view, model.durationSec);
  const placed = useMemo(
    () => thinMarkers(model.markers, shown, { widthPx, keep: props.active }),
    [model.markers, shown, widthPx, props.active],
  );
  const data: ChartData<'scatter'> = useMemo(
    () => ({
      datasets: [
        {
          label: 'Capnogram',
          data: model.wave,
          showLine: true,
          borderColor: c.seriesSoft,
          borderWidth: 1,
          pointRadius: 0,
        },
        {
          label: 'Per-breath EtCO2',
          data: model.breaths,
          showLine: true,
          borderColor: c.series,
          borderWidth: 2,
          pointRadius: 0,
        },
        {
          label: 'Entered EtCO2',
          data: model.manual,
          backgroundColor: c.series,
          pointRadius: 5,
          pointStyle: 'circle',
        },
        {
          label: 'Imported EtCO2',
          data: model.imported,
          backgroundColor: '#7b4fa0',
          pointRadius: 4,
          pointStyle: 'rectRot',
        },
      ].filter((ds) => ds.data.length > 0),
    }),
    [model, c],
  );
  const yMax = model.yMax;
  const options: ChartOptions<'scatter'> = {
    animation: false,
    maintainAspectRatio: false,
    color: c.text,
    borderColor: c.grid,
    scales: {
      x: {
        type: 'linear',
        min: shown.startSec,
        max: shown.endSec,
        title: { display: true, text: 'Time from arrest (min:s)' },
        // Round times only, whatever the view: the whole code uses capno's round minutes.
        afterBuildTicks: (axis) => {
          const whole = axis.min <= 0 && axis.max >= model.durationSec;
          axis.ticks = (whole ? model.ticks : roundTicks(axis.min, axis.max)).map((value) => ({
            value,
          }));
        },
        ticks: { callback: (v) => clockFromArrest(Number(v)) },
      },
      y: { min: 0, max: yMax, title: { display: true, text: etco2Heading(model.unit) } },
    },
    plugins: {
      legend: { position: 'bottom' },
      tooltip: { callbacks: { title: (items) => clockFromArrest(items[0]?.parsed.x ?? 0) } },
      annotation: { annotations: annotationsOf(model, highlight, yMax, props, placed, c) },
      zoom: {
        pan: { enabled: true, mode: 'x', onPanComplete: fromChart },
        zoom: {
          wheel: { enabled: true },
          pinch: { enabled: true },
          mode: 'x',
          onZoomComplete: fromChart,
        },
        limits: { x: { min: 0, max: model.durationSec } },
      },
    } as ChartOptions<'scatter'>['plugins'],
  };
  return (
    <Box>
      <Stack direction="row" sx={{ alignItems: 'center', justifyContent: 'space-between', mb: 1 }}>
        <Typography aria-live="polite" data-testid="timeline-view">
          Showing {clockFromArrest(shown.startSec)} – {clockFromArrest(shown.endSec)}
        </Typography>
        <Button
          onClick={() => {
            ref.current?.resetZoom?.();
            reset();
            onResetView();
          }}
          sx={{ minHeight: 48 }}
        >
          Show whole code
        </Button>
      </Stack>
      <Box
        sx={{ height: 380 }}
        role="img"
        aria-label={`EtCO2 timeline: ${model.markers.length} event markers, ${model.low.length} low-EtCO2 intervals shaded, ${model.compressions.length} compression periods, ${model.rises.length} EtCO2 rises, ${model.gaps.length} data gaps (no capnogram stored)`}
        data-markers={model.markers.length}
        // Markers drawn at this zoom (the rest are in the event table; zoom in for them).
        data-markers-shown={placed.length}
        data-low-intervals={model.low.length}
        // The grey data-gap bands drawn on the chart, as "start–end" seconds from the arrest.
        data-gaps={model.gaps.map((g) => `${g.startSec}-${g.endSec}`).join(' ')}
      >
        <Scatter
          ref={ref}
          data={data}
          options={options}
          plugins={[widthPlugin]}
          // The box around it is the image and carries its description.
          aria-hidden
        />
      </Box>
      <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
        Shaded red: EtCO2 below {model.lowText} during compressions · green: compressions · blue:
        ROSC · grey: no capnogram stored · vertical blue line: EtCO2 rise (dashed: after a
        confounder). Hover or tap a code for the event; drag or pinch to pan and zoom.
        {placed.length < model.markers.length &&
          ` ${placed.length} of ${model.markers.length} event codes fit at this zoom: zoom in for the rest; the event table lists them all.`}
      </Typography>
      <MarkerLegend />
    </Box>
  );
}
