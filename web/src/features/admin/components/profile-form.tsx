import { Alert, Box, Button, Stack, TextField, Typography } from '@mui/material';
import {
  type ProtocolProfile,
  type ThresholdGroup,
  thresholdFields,
  thresholdGroupLabels,
  thresholdKeys,
} from '@upstroke/contracts';
import { useForm } from 'react-hook-form';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { useCreateProfile } from '../api/create-profile';
import { apiErrorText } from './api-error';
import { ProfileField } from './profile-field';
import {
  initialValues,
  profileBody,
  profileResolver,
  type ProfileFormValues,
} from './profile-form-values';

const groups = Object.keys(thresholdGroupLabels) as ThresholdGroup[];

/** Every threshold of a site's profile, with its guideline default and source beside it. */
export function ProfileForm({
  siteId,
  basis,
  onSaved,
}: {
  siteId: string;
  basis: ProtocolProfile | null;
  onSaved: (p: ProtocolProfile) => void;
}) {
  const create = useCreateProfile(onSaved);
  const form = useForm<ProfileFormValues>({
    resolver: profileResolver,
    values: initialValues(siteId, basis),
  });
  const { register, handleSubmit, reset, formState } = form;
  const submit = handleSubmit((values) => create.mutate(profileBody(values)));
  return (
    <Box component="form" noValidate onSubmit={(e) => void submit(e)} aria-label="Protocol profile">
      <Stack spacing={2}>
        <ClinicalCaution text="Thresholds decide which findings the debrief shows; they never diagnose. Saving creates a new version: records keep the version in force when they began." />
        {create.isError && <Alert severity="error">{apiErrorText(create.error)}</Alert>}
        <TextField
          label="Profile name"
          {...register('name')}
          error={Boolean(formState.errors.name)}
          helperText={formState.errors.name?.message}
          sx={{ maxWidth: 420 }}
        />
        {groups.map((group) => (
          <Box key={group} component="fieldset" sx={{ border: 0, p: 0, m: 0 }}>
            <Typography component="legend" variant="h3" sx={{ mb: 1.5 }}>
              {thresholdGroupLabels[group]}
            </Typography>
            <Box
              sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: '1fr 1fr' } }}
            >
              {thresholdKeys
                .filter((k) => thresholdFields[k].group === group)
                .map((key) => (
                  <ProfileField key={key} name={key} form={form} />
                ))}
            </Box>
          </Box>
        ))}
        <Stack direction="row" spacing={1} sx={{ justifyContent: 'flex-end' }}>
          <Button onClick={() => reset(initialValues(siteId, null))}>
            Fill in guideline defaults
          </Button>
          <Button type="submit" variant="contained" disabled={create.isPending}>
            Save as new version
          </Button>
        </Stack>
      </Stack>
    </Box>
  );
}
