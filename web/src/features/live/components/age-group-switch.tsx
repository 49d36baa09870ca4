import { Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { type AgeGroup, ageGroupLabels } from '@upstroke/contracts';

export type OnAgeGroup = (ageGroup: AgeGroup) => void;

const groups: AgeGroup[] = ['adult', 'child', 'infant'];

/**
 * The record's age group inside a dose or energy dialog, so a wrong one is put right where it
 * matters. A change is saved on the record and recorded as an entry (never silently).
 */
export function AgeGroupSwitch(props: { value: AgeGroup; onChange: OnAgeGroup }) {
  return (
    <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
      <Typography variant="body2" id="age-group-label">
        Patient
      </Typography>
      <ToggleButtonGroup
        exclusive
        value={props.value}
        onChange={(_, v: AgeGroup | null) => v && v !== props.value && props.onChange(v)}
        aria-labelledby="age-group-label"
      >
        {groups.map((g) => (
          <ToggleButton key={g} value={g} sx={{ minHeight: 48, minWidth: 72 }}>
            {ageGroupLabels[g]}
          </ToggleButton>
        ))}
      </ToggleButtonGroup>
    </Stack>
  );
}
