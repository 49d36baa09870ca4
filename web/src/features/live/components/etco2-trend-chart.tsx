import {
  CategoryScale,
  Chart as ChartJS,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import annotationPlugin from 'chartjs-plugin-annotation';
import { type Etco2DisplayUnit, formatEtco2 } from '@upstroke/contracts';
import { Line } from 'react-chartjs-2';
import { useChartColours } from '../../../hooks/use-chart-colours';

ChartJS.register(LinearScale, CategoryScale, PointElement, LineElement, Tooltip, annotationPlugin);

/** The trend's chart (Chart.js, in its own chunk: Live is usable before it arrives). */
export function Etco2TrendChart(props: {
  points: { x: number; y: number }[];
  lowMmHg: number;
  unit: Etco2DisplayUnit;
  scale: number;
}) {
  const { points, scale } = props;
  const c = useChartColours();
  return (
    <Line
      role="img"
      aria-label={`EtCO2 trend, ${points.length} values, low band below ${formatEtco2(props.lowMmHg, props.unit)}`}
      data={{
        datasets: [{ data: points, borderColor: c.mark, backgroundColor: c.mark, pointRadius: 3 }],
      }}
      options={{
        animation: false,
        maintainAspectRatio: false,
        color: c.text,
        borderColor: c.grid,
        scales: {
          x: { type: 'linear', min: 0, title: { display: true, text: 'min' } },
          y: { min: 0, suggestedMax: 40 * scale },
        },
        plugins: {
          legend: { display: false },
          annotation: {
            annotations: {
              low: {
                type: 'box',
                yMin: 0,
                yMax: props.lowMmHg * scale,
                backgroundColor: c.lowBand,
                borderWidth: 0,
              },
            },
          },
        },
      }}
    />
  );
}
