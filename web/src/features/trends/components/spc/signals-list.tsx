import { Alert, Stack, Typography } from '@mui/material';
import type { ControlChartResponse } from '@upstroke/contracts';
import { ClinicalCaution } from '../../../../components/ui/clinical-caution';

/** Each signal in plain words, then the rule set and where it comes from. */
export function SignalsList({
  chart,
  monthName,
}: {
  chart: ControlChartResponse;
  monthName: (month: string) => string;
}) {
  const withData = chart.points.some((p) => p.value !== null);
  return (
    <Stack spacing={1} sx={{ mt: 1 }}>
      {chart.signals.length === 0 ? (
        <Typography variant="body2">
          {withData && chart.centre !== null
            ? 'No signal: the variation is within what chance alone would give.'
            : 'Not enough data in the baseline to draw limits.'}
        </Typography>
      ) : (
        <Stack
          component="ul"
          spacing={1}
          sx={{ pl: 0, m: 0, listStyle: 'none' }}
          aria-label="Signals"
        >
          {chart.signals.map((s) => (
            <li key={`${s.rule}-${s.month}`}>
              <Alert severity="info" variant="outlined" role="note">
                <strong data-month={s.month}>{monthName(s.month)}</strong>: {s.explanation}
              </Alert>
            </li>
          ))}
        </Stack>
      )}
      <Typography variant="caption" color="text.secondary">
        Rules: {chart.rules.names.join('; ')}. {chart.rules.source}
        {chart.baseline
          ? ` Baseline ${monthName(chart.baseline.from)} to ${monthName(chart.baseline.to)}.`
          : ''}
        {chart.target !== null ? ` Target ${Math.round(chart.target * 100)} %.` : ''}
      </Typography>
      <ClinicalCaution dense />
    </Stack>
  );
}
