import { Box } from '@mui/material';
import type { FunnelResponse } from '@upstroke/contracts';
import { Chart as ChartJS, LinearScale, LineElement, PointElement, Tooltip } from 'chart.js';
import { Scatter } from 'react-chartjs-2';
import { useChartColours } from '../../../../hooks/use-chart-colours';

ChartJS.register(LinearScale, PointElement, LineElement, Tooltip);

const pct = (v: number) => Math.round(v * 1000) / 10;
const line = (label: string, color: string, data: { x: number; y: number }[], dash: number[]) => ({
  label,
  data,
  showLine: true,
  borderColor: color,
  borderDash: dash,
  borderWidth: 1,
  pointRadius: 0,
});

/**
 * The funnel: each unit's share against its number of records, with the 95 % and 99.8 %
 * limits narrowing as n grows. A click on a unit opens its records.
 */
export function FunnelCanvas({
  funnel,
  onPoint,
}: {
  funnel: FunnelResponse;
  onPoint: (index: number) => void;
}) {
  const chartColours = useChartColours();
  const shown = funnel.points.flatMap((p, i) => (p.p === null ? [] : [{ p, i }]));
  const curve = funnel.curve;
  const maxN = curve.at(-1)?.n ?? 1;
  const t = funnel.target;
  return (
    <Box role="img" aria-label="Funnel plot; the table below lists every unit" sx={{ height: 280 }}>
      <Scatter
        // The box around it is the image and carries its description.
        aria-hidden
        data={{
          datasets: [
            {
              label: 'Units',
              data: shown.map(({ p }) => ({ x: p.n, y: pct(p.p ?? 0) })),
              backgroundColor: shown.map(({ p }) => (p.zone === 'within' ? '#1565c0' : '#c62828')),
              pointStyle: shown.map(({ p }) => (p.zone === 'within' ? 'circle' : 'triangle')),
              pointRadius: 6,
            },
            ...(t === null
              ? []
              : [
                  line(
                    'Pooled share',
                    '#2e7d32',
                    [
                      { x: 1, y: pct(t) },
                      { x: maxN, y: pct(t) },
                    ],
                    [],
                  ),
                  line(
                    '95 % upper',
                    '#6d4c41',
                    curve.map((c) => ({ x: c.n, y: pct(c.upper95) })),
                    [4, 3],
                  ),
                  line(
                    '95 % lower',
                    '#6d4c41',
                    curve.map((c) => ({ x: c.n, y: pct(c.lower95) })),
                    [4, 3],
                  ),
                  line(
                    '99.8 % upper',
                    '#4e342e',
                    curve.map((c) => ({ x: c.n, y: pct(c.upper998) })),
                    [],
                  ),
                  line(
                    '99.8 % lower',
                    '#4e342e',
                    curve.map((c) => ({ x: c.n, y: pct(c.lower998) })),
                    [],
                  ),
                ]),
          ],
        }}
        options={{
          responsive: true,
          maintainAspectRatio: false,
          color: chartColours.text,
          borderColor: chartColours.grid,
          onClick: (_e, elements) => {
            const hit = elements.find((el) => el.datasetIndex === 0);
            if (hit) onPoint(shown[hit.index]!.i);
          },
          plugins: {
            legend: { display: false },
            tooltip: {
              callbacks: {
                label: (ctx) =>
                  ctx.datasetIndex === 0
                    ? `${funnel.points[shown[ctx.dataIndex]!.i]!.name}: ${ctx.parsed.y} % (n=${ctx.parsed.x})`
                    : `${ctx.dataset.label}`,
              },
            },
          },
          scales: {
            x: { type: 'linear', min: 0, title: { display: true, text: 'Records (n)' } },
            y: { min: 0, max: 100, title: { display: true, text: '%' } },
          },
        }}
      />
    </Box>
  );
}
