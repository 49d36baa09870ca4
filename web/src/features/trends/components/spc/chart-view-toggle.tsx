import { ToggleButton, ToggleButtonGroup } from '@mui/material';

export type ChartView = 'line' | 'control';

/** Switches a trend card between its monthly line and its control chart. */
export function ChartViewToggle({
  title,
  value,
  onChange,
}: {
  title: string;
  value: ChartView;
  onChange: (v: ChartView) => void;
}) {
  return (
    <ToggleButtonGroup
      size="small"
      exclusive
      value={value}
      onChange={(_e, v: ChartView | null) => v && onChange(v)}
      aria-label={`${title}: how to show it`}
      className="no-print"
    >
      <ToggleButton value="line">Monthly line</ToggleButton>
      <ToggleButton value="control">Control chart</ToggleButton>
    </ToggleButtonGroup>
  );
}
