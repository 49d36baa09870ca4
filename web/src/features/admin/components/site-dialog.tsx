import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  MenuItem,
  Stack,
  TextField,
} from '@mui/material';
import type { Site } from '@upstroke/contracts';
import { Controller, useForm } from 'react-hook-form';
import { useSaveSite } from '../api/save-site';
import { apiErrorText } from './api-error';
import { SiteDisplayFields } from './site-display-fields';
import {
  siteFormDefaults,
  type SiteFormInput,
  type SiteFormOutput,
  siteFormSchema,
} from './site-form';

/** Create a site (site = null) or change its name, units of display, clock and e-mail domains. */
export function SiteDialog({ site, onClose }: { site: Site | null; onClose: () => void }) {
  const save = useSaveSite();
  const { register, control, handleSubmit, formState } = useForm<
    SiteFormInput,
    unknown,
    SiteFormOutput
  >({ resolver: zodResolver(siteFormSchema), defaultValues: siteFormDefaults(site) });
  const submit = handleSubmit((body) =>
    save.mutate({ id: site?.id, body }, { onSuccess: onClose }),
  );
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="xs" aria-labelledby="site-dialog-title">
      <form noValidate onSubmit={(e) => void submit(e)}>
        <DialogTitle id="site-dialog-title">{site ? `Edit ${site.name}` : 'New site'}</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {save.isError && <Alert severity="error">{apiErrorText(save.error)}</Alert>}
            <TextField
              label="Site name"
              {...register('name')}
              error={Boolean(formState.errors.name)}
              helperText={formState.errors.name?.message}
            />
            <Controller
              control={control}
              name="etco2Unit"
              render={({ field }) => (
                <TextField
                  select
                  label="EtCO2 display unit"
                  {...field}
                  helperText="Thresholds are stored in mmHg; screens and PDFs show this unit"
                >
                  <MenuItem value="mmHg">mmHg</MenuItem>
                  <MenuItem value="kPa">kPa</MenuItem>
                </TextField>
              )}
            />
            <Controller
              control={control}
              name="paperSize"
              render={({ field }) => (
                <TextField select label="Paper size for PDFs" {...field}>
                  <MenuItem value="A4">A4</MenuItem>
                  <MenuItem value="Letter">Letter</MenuItem>
                </TextField>
              )}
            />
            <SiteDisplayFields control={control} register={register} errors={formState.errors} />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={save.isPending}>
            {site ? 'Save' : 'Create site'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
