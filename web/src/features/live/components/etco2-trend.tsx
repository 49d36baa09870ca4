import { Box, Typography } from '@mui/material';
import { toMmHg } from '@upstroke/capno';
import {
  CategoryScale,
  Chart as ChartJS,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import annotationPlugin from 'chartjs-plugin-annotation';
import { memo } from 'react';
import { Line } from 'react-chartjs-2';
import type { LocalEtco2 } from '../../../lib/offline';

ChartJS.register(LinearScale, CategoryScale, PointElement, LineElement, Tooltip, annotationPlugin);

/** A small trend of recorded EtCO2 over the code, with the site's low band shaded. */
export const Etco2Trend = memo(function Etco2Trend(props: {
  arrestAt: string;
  values: LocalEtco2[];
  lowMmHg: number;
  unit: 'mmHg' | 'kPa';
}) {
  const t0 = Date.parse(props.arrestAt);
  const scale = props.unit === 'kPa' ? 1 / toMmHg(1, 'kPa') : 1;
  const points = props.values.map((v) => ({
    x: (Date.parse(v.at) - t0) / 60_000,
    y: toMmHg(v.value, v.unit) * scale,
  }));
  const last = props.values.at(-1);
  return (
    <Box>
      <Typography variant="subtitle2">
        EtCO2 {last ? `· last ${last.value} ${last.unit}` : '· none yet'}
      </Typography>
      <Box sx={{ height: 140 }}>
        <Line
          role="img"
          aria-label={`EtCO2 trend, ${points.length} values, low band below ${Math.round(props.lowMmHg * scale * 10) / 10} ${props.unit}`}
          data={{
            datasets: [
              { data: points, borderColor: '#c2410c', backgroundColor: '#c2410c', pointRadius: 3 },
            ],
          }}
          options={{
            animation: false,
            maintainAspectRatio: false,
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
                    backgroundColor: 'rgba(179,38,30,0.15)',
                    borderWidth: 0,
                  },
                },
              },
            },
          }}
        />
      </Box>
    </Box>
  );
});
