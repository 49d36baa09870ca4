import {
  Box,
  Checkbox,
  FormControlLabel,
  InputAdornment,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import {
  CONFIRM_FACTOR,
  differsFromDefault,
  formatEtco2Both,
  needsConfirmation,
  type Thresholds,
  thresholdDefaults,
  thresholdFields,
  thresholdRange,
  thresholdSources,
} from '@upstroke/contracts';
import { type UseFormReturn, useWatch } from 'react-hook-form';
import type { ProfileFormValues } from './profile-form-values';

/**
 * One threshold: its value, the guideline default with its published source, a mark when it
 * differs from the default, and — when it is more than 2× away — a confirmation with a local
 * source or reason.
 */
export function ProfileField({
  name,
  form,
}: {
  name: keyof Thresholds;
  form: UseFormReturn<ProfileFormValues>;
}) {
  const { register, control, formState } = form;
  const { label, unit, step } = thresholdFields[name];
  const { min, max } = thresholdRange(name);
  const value = useWatch({ control, name: `thresholds.${name}` });
  const numeric = typeof value === 'number' && Number.isFinite(value);
  const differs = numeric && differsFromDefault(name, value);
  const confirm = numeric && value >= min && value <= max && needsConfirmation(name, value);
  const error = formState.errors.thresholds?.[name]?.message;
  const confirmErrors = formState.errors.confirmations?.[name];
  const u = unit ? ` ${unit}` : '';
  // Profiles are stored in mmHg; a kPa site's admin reads the default in kPa beside it.
  const shownDefault =
    unit === 'mmHg' ? formatEtco2Both(thresholdDefaults[name]) : `${thresholdDefaults[name]}${u}`;
  return (
    <Box>
      <TextField
        fullWidth
        label={label}
        type="number"
        {...register(`thresholds.${name}`, { valueAsNumber: true })}
        error={Boolean(error)}
        helperText={error ?? `Default ${shownDefault} — ${thresholdSources[name]}`}
        slotProps={{
          htmlInput: { step, min, max },
          input: unit
            ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> }
            : undefined,
        }}
      />
      {differs && (
        <Typography variant="caption" color="warning.main" sx={{ fontWeight: 600 }}>
          Differs from the guideline default ({thresholdDefaults[name]}
          {u})
        </Typography>
      )}
      {confirm && (
        <Stack spacing={1} sx={{ mt: 1, p: 1.5, border: 1, borderColor: 'warning.main' }}>
          <FormControlLabel
            control={<Checkbox {...register(`confirmations.${name}.confirmed`)} />}
            label={`I confirm ${value}${u}: more than ${CONFIRM_FACTOR} times away from the guideline default`}
          />
          {confirmErrors?.confirmed?.message && (
            <Typography variant="caption" color="error">
              {confirmErrors.confirmed.message}
            </Typography>
          )}
          <TextField
            size="small"
            label={`Local source or reason for ${label}`}
            {...register(`confirmations.${name}.reason`)}
            error={Boolean(confirmErrors?.reason ?? confirmErrors?.message)}
            helperText={
              confirmErrors?.reason?.message ??
              confirmErrors?.message ??
              'For example the local protocol and its version'
            }
          />
        </Stack>
      )}
    </Box>
  );
}
