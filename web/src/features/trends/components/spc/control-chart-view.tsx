import { Box, LinearProgress, MenuItem, TextField } from '@mui/material';
import { type SpcMeasure, spcMeasureLabels, type TrendsFilter } from '@upstroke/contracts';
import { useState } from 'react';
import { ErrorState, Loading } from '../../../../components/ui/states';
import { useDisplayFormat } from '../../../../hooks/use-display-format';
import { useControlChart } from '../../api/get-control-chart';
import { useBaseline } from '../../hooks/use-baseline';
import { BaselineFields } from './baseline-fields';
import { ControlChartCanvas } from './control-chart-canvas';
import { ControlPointsTable } from './control-points-table';
import { type PointSelection, PointRecordsDialog } from './point-records-dialog';
import { SignalsList } from './signals-list';

/**
 * A trend card's control-chart view: the chart, its signals in words, the committee's
 * baseline, and every point opening the records behind it.
 */
export function ControlChartView({
  measures,
  filter,
}: {
  measures: SpcMeasure[];
  filter: TrendsFilter;
}) {
  const [measure, setMeasure] = useState<SpcMeasure>(measures[0]!);
  const [baseline, setBaseline] = useBaseline();
  const [point, setPoint] = useState<PointSelection | null>(null);
  const chart = useControlChart(filter, measure, baseline);
  const title = spcMeasureLabels[measure];
  const { month } = useDisplayFormat(filter.siteId);
  const open = (i: number) => {
    const p = chart.data?.points[i];
    if (p && p.n > 0) setPoint({ label: `${month(p.month)} (${title})`, records: p.records });
  };
  return (
    <>
      {measures.length > 1 ? (
        <TextField
          select
          size="small"
          label="Control chart of"
          value={measure}
          onChange={(e) => setMeasure(e.target.value as SpcMeasure)}
          sx={{ mb: 1, minWidth: 260 }}
        >
          {measures.map((m) => (
            <MenuItem key={m} value={m}>
              {spcMeasureLabels[m]}
            </MenuItem>
          ))}
        </TextField>
      ) : null}
      {chart.isPending ? (
        <Loading label="Loading control chart…" />
      ) : chart.error ? (
        <ErrorState
          error={chart.error}
          // A baseline outside the months now in view is refused: start again from every month.
          onRetry={() =>
            baseline.baselineFrom || baseline.baselineTo ? setBaseline({}) : void chart.refetch()
          }
        />
      ) : (
        <>
          <BaselineFields
            months={chart.data.points.map((p) => p.month)}
            value={baseline}
            onChange={setBaseline}
            monthName={month}
          />
          {/* The previous chart stays while the new baseline's is fetched: say so. */}
          {chart.isPlaceholderData && (
            <LinearProgress aria-label="Updating the control chart" sx={{ my: 0.5 }} />
          )}
          <Box
            aria-busy={chart.isPlaceholderData}
            sx={{ opacity: chart.isPlaceholderData ? 0.6 : 1 }}
          >
            <ControlChartCanvas chart={chart.data} title={title} onPoint={open} monthName={month} />
            <SignalsList chart={chart.data} monthName={month} />
            <ControlPointsTable chart={chart.data} title={title} onPoint={open} monthName={month} />
          </Box>
        </>
      )}
      <PointRecordsDialog point={point} onClose={() => setPoint(null)} />
    </>
  );
}
