import { MenuItem, Stack, TextField } from '@mui/material';
import type { BaselineMonths } from '../../api/get-control-chart';

/**
 * The committee's baseline: the months that fix the centre line and limits (default: every
 * month in view). Later months are then judged against it.
 */
export function BaselineFields({
  months,
  value,
  onChange,
  monthName,
}: {
  months: string[];
  /** A month in the site's words ("Mar 2026"); the value stays "2026-03". */
  monthName: (month: string) => string;
  value: BaselineMonths;
  onChange: (b: BaselineMonths) => void;
}) {
  const field = (key: keyof BaselineMonths, label: string, allowed: string[]) => (
    <TextField
      select
      size="small"
      label={label}
      value={value[key] ?? ''}
      onChange={(e) => onChange({ ...value, [key]: e.target.value || undefined })}
      sx={{ minWidth: 160 }}
    >
      <MenuItem value="">{key === 'baselineFrom' ? 'First month' : 'Last month'}</MenuItem>
      {allowed.map((m) => (
        <MenuItem key={m} value={m}>
          {monthName(m)}
        </MenuItem>
      ))}
    </TextField>
  );
  const afterFrom = months.filter((m) => !value.baselineFrom || m >= value.baselineFrom);
  const beforeTo = months.filter((m) => !value.baselineTo || m <= value.baselineTo);
  return (
    <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
      {field('baselineFrom', 'Baseline from', beforeTo)}
      {field('baselineTo', 'Baseline to', afterFrom)}
    </Stack>
  );
}
