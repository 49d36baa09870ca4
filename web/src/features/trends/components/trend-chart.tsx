import { Box, Card, CardContent, Stack, Typography } from '@mui/material';
import type { SpcMeasure, TrendPoint, TrendsFilter } from '@upstroke/contracts';
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
import { useState } from 'react';
import { Line } from 'react-chartjs-2';
import { useChartColours } from '../../../hooks/use-chart-colours';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { type ChartView, ChartViewToggle } from './spc/chart-view-toggle';
import { ControlChartView } from './spc/control-chart-view';

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
  /** Control charts this card can switch to (none: the line only). */
  spc?: SpcMeasure[];
}

/**
 * One monthly series; the x axis names each month with its n, a month without records is a
 * gap (never a line drawn across it), and the dashed line is the profile's target, named in
 * the caption rather than on the plot so no label covers a point.
 */
export function TrendChart({
  title,
  scale,
  unit,
  points,
  target,
  spc,
  filter = {},
}: ChartSpec & { filter?: TrendsFilter }) {
  const chartColours = useChartColours();
  const [view, setView] = useState<ChartView>('line');
  const control = view === 'control' && Boolean(spc?.length);
  const { month } = useDisplayFormat(filter.siteId);
  const labels = points.map((p) => `${month(p.month)} (n=${p.n})`);
  const values = points.map((p) =>
    p.value === null || p.n === 0 ? null : Math.round(p.value * scale * 10) / 10,
  );
  const summary = points
    .flatMap((p, i) =>
      values[i] === null ? [] : [`${month(p.month)}: ${values[i]} ${unit} (n=${p.n})`],
    )
    .join('; ');
  return (
    <Card variant="outlined">
      <CardContent>
        <Stack direction="row" sx={{ justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}>
          <Typography variant="h3" component="h3" gutterBottom>
            {title}
          </Typography>
          {spc?.length ? <ChartViewToggle title={title} value={view} onChange={setView} /> : null}
        </Stack>
        <Typography variant="body2" color="text.secondary" gutterBottom>
          {target === null
            ? 'No target in the protocol profile'
            : `Dashed line: target ${Math.round(target * scale * 10) / 10} ${unit} (protocol profile)`}
          {points.some((p) => p.n === 0) ? ' · gaps: months without records' : ''}
        </Typography>
        {control && spc ? <ControlChartView measures={spc} filter={filter} /> : null}
        <Box
          role="img"
          aria-label={`${title}. ${target === null ? '' : `Target ${Math.round(target * scale * 10) / 10} ${unit}. `}${summary || 'No records in this period.'}`}
          sx={{ height: 220, display: control ? 'none' : undefined }}
        >
          <Line
            // The box around it is the image and carries its description.
            aria-hidden
            data={{
              labels,
              datasets: [
                {
                  label: `${title} (${unit})`,
                  data: values,
                  spanGaps: false,
                  borderColor: '#1565c0',
                  backgroundColor: '#1565c0',
                },
              ],
            }}
            options={{
              responsive: true,
              maintainAspectRatio: false,
              color: chartColours.text,
              borderColor: chartColours.grid,
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
