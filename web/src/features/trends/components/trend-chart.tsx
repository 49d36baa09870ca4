import { Box, Card, CardContent, Typography } from '@mui/material';
import type { TrendPoint } from '@upstroke/contracts';
import {
  CategoryScale,
  Chart as ChartJS,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';
import annotationPlugin from 'chartjs-plugin-annotation';
import { Line } from 'react-chartjs-2';

ChartJS.register(
  CategoryScale,
  LinearScale,
  PointElement,
  LineElement,
  Tooltip,
  Legend,
  annotationPlugin,
);

export interface ChartSpec {
  title: string;
  /** Shown values are multiplied by this (100 for percentages). */
  scale: number;
  unit: string;
  points: TrendPoint[];
  target: number | null;
}

/** One monthly series; the x axis names each month with its n, the dashed line is the target. */
export function TrendChart({ title, scale, unit, points, target }: ChartSpec) {
  const labels = points.map((p) => `${p.month} (n=${p.n})`);
  const values = points.map((p) =>
    p.value === null ? null : Math.round(p.value * scale * 10) / 10,
  );
  const summary = points
    .flatMap((p, i) => (values[i] === null ? [] : [`${p.month}: ${values[i]} ${unit} (n=${p.n})`]))
    .join('; ');
  return (
    <Card variant="outlined">
      <CardContent>
        <Typography variant="h3" component="h3" gutterBottom>
          {title}
        </Typography>
        <Box
          role="img"
          aria-label={`${title}. ${summary || 'No records in this period.'}`}
          sx={{ height: 220 }}
        >
          <Line
            data={{
              labels,
              datasets: [
                {
                  label: `${title} (${unit})`,
                  data: values,
                  spanGaps: true,
                  borderColor: '#1565c0',
                  backgroundColor: '#1565c0',
                },
              ],
            }}
            options={{
              responsive: true,
              maintainAspectRatio: false,
              plugins: {
                legend: { display: false },
                annotation: {
                  annotations:
                    target === null
                      ? {}
                      : {
                          target: {
                            type: 'line',
                            yMin: target * scale,
                            yMax: target * scale,
                            borderColor: '#2e7d32',
                            borderDash: [6, 4],
                            label: {
                              display: true,
                              content: `Target ${target * scale} ${unit}`,
                              position: 'end',
                            },
                          },
                        },
                },
              },
              scales: { y: { beginAtZero: true, title: { display: true, text: unit } } },
            }}
          />
        </Box>
      </CardContent>
    </Card>
  );
}
