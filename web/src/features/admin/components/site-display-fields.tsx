import { Autocomplete, MenuItem, TextField } from '@mui/material';
import { type Control, Controller, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { SiteFormInput, SiteFormOutput } from './site-form';

const zones: string[] =
  typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : ['UTC'];

interface Props {
  control: Control<SiteFormInput, unknown, SiteFormOutput>;
  register: UseFormRegister<SiteFormInput>;
  errors: FieldErrors<SiteFormInput>;
}

/** How the site's people read dates and times, and where its e-mail may go. */
export function SiteDisplayFields({ control, register, errors }: Props) {
  return (
    <>
      <TextField
        label="Language for dates and numbers"
        {...register('locale')}
        error={Boolean(errors.locale)}
        helperText={errors.locale?.message ?? 'A language tag, e.g. en-GB, en-US, fr-CA'}
      />
      <Controller
        control={control}
        name="timeZone"
        render={({ field, fieldState }) => (
          <Autocomplete
            options={zones}
            value={field.value ?? 'UTC'}
            onChange={(_, v) => field.onChange(v)}
            disableClearable
            renderInput={(params) => (
              <TextField
                {...params}
                label="Time zone"
                error={Boolean(fieldState.error)}
                helperText={fieldState.error?.message ?? 'Clock times on screens, PDFs and e-mail'}
              />
            )}
          />
        )}
      />
      <Controller
        control={control}
        name="clock"
        render={({ field }) => (
          <TextField select label="Clock" {...field}>
            <MenuItem value="24h">24-hour (14:05)</MenuItem>
            <MenuItem value="12h">12-hour (2:05 pm)</MenuItem>
          </TextField>
        )}
      />
      <TextField
        label="Organisation e-mail domains"
        {...register('mailDomains')}
        error={Boolean(errors.mailDomains)}
        helperText={
          errors.mailDomains?.message ??
          'Debriefs are e-mailed only to these domains, separated by commas (empty: any address)'
        }
      />
    </>
  );
}
