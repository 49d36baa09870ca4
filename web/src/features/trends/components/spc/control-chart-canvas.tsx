import { Box } from '@mui/material';
import type { ControlChartResponse } from '@upstroke/contracts';
import {
  CategoryScale,
  Chart as ChartJS,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import { Line } from 'react-chartjs-2';
import { useChartColours } from '../../../../hooks/use-chart-colours';
import { axisUnit, chartValue, formatSpcValue } from './spc-format';

ChartJS.register(CategoryScale, LinearScale, PointElement, LineElement, Tooltip);

const SIGNAL = '#c62828';
const VALUE = '#1565c0';
const LIMIT = '#6d4c41';

/**
 * The control chart: monthly values, centre line, limits per point (stepped, since each
 * month's n gives its own), signal points drawn as red triangles. A click on a point opens the
 * records behind it (the table below does the same from the keyboard).
 */
export function ControlChartCanvas({
  chart,
  title,
  onPoint,
  monthName,
}: {
  chart: ControlChartResponse;
  title: string;
  onPoint: (index: number) => void;
  monthName: (month: string) => string;
}) {
  const chartColours = useChartColours();
  const m = chart.measure;
  const pts = chart.points;
  const values = pts.map((p) => chartValue(m, p.value));
  const centre = chartValue(m, chart.centre);
  const summary = pts
    .filter((p) => p.value !== null)
    .map(
      (p) =>
        `${monthName(p.month)}: ${formatSpcValue(m, p.value)} (n=${p.n})${p.signal ? ', signal' : ''}`,
    )
    .join('; ');
  const limit = (label: string, data: (number | null)[]) => ({
    label,
    data,
    borderColor: LIMIT,
    borderDash: [4, 3],
    borderWidth: 1,
    pointRadius: 0,
    stepped: 'middle' as const,
  });
  return (
    <Box
      role="img"
      aria-label={`Control chart of ${title}. Centre ${formatSpcValue(m, chart.centre)}. ${summary || 'No records in this period.'}`}
      sx={{ height: 260 }}
    >
      <Line
        // The box around it is the image and carries its description.
        aria-hidden
        data={{
          labels: pts.map((p) => `${monthName(p.month)} (n=${p.n})`),
          datasets: [
            {
              label: title,
              data: values,
              borderColor: VALUE,
              pointBackgroundColor: pts.map((p) => (p.signal ? SIGNAL : VALUE)),
              pointStyle: pts.map((p) => (p.signal ? 'triangle' : 'circle')),
              pointRadius: pts.map((p) => (p.signal ? 7 : 4)),
            },
            {
              label: 'Centre line',
              data: pts.map(() => centre),
              borderColor: '#2e7d32',
              borderWidth: 1,
              pointRadius: 0,
            },
            limit(
              'Upper control limit',
              pts.map((p) => chartValue(m, p.upper)),
            ),
            limit(
              'Lower control limit',
              pts.map((p) => chartValue(m, p.lower)),
            ),
          ],
        }}
        options={{
          responsive: true,
          maintainAspectRatio: false,
          color: chartColours.text,
          borderColor: chartColours.grid,
          onClick: (_e, elements) => {
            const hit = elements.find((el) => el.datasetIndex === 0);
            if (hit) onPoint(hit.index);
          },
          plugins: { legend: { display: false } },
          scales: { y: { beginAtZero: true, title: { display: true, text: axisUnit(m) } } },
        }}
      />
    </Box>
  );
}
