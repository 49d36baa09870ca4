import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  TextField,
} from '@mui/material';
import { type UnitName, unitNameSchema } from '@upstroke/contracts';
import { useForm } from 'react-hook-form';
import { useSaveUnit } from '../api/save-unit';
import { apiErrorText } from './api-error';

/** Add a unit to a site, or rename one (its id, and so its records, stay the same). */
export function UnitDialog(props: {
  siteId: string;
  unit: { id: string; name: string } | null;
  onClose: () => void;
}) {
  const { siteId, unit, onClose } = props;
  const save = useSaveUnit();
  const { register, handleSubmit, formState } = useForm<UnitName>({
    resolver: zodResolver(unitNameSchema),
    defaultValues: { name: unit?.name ?? '' },
  });
  const submit = handleSubmit(({ name }) =>
    save.mutate({ siteId, unitId: unit?.id, name }, { onSuccess: onClose }),
  );
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="xs" aria-labelledby="unit-dialog-title">
      <form noValidate onSubmit={(e) => void submit(e)}>
        <DialogTitle id="unit-dialog-title">
          {unit ? `Rename ${unit.name}` : 'Add unit'}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ pt: 1 }}>
            {save.isError && <Alert severity="error">{apiErrorText(save.error)}</Alert>}
            <TextField
              label="Unit name"
              autoFocus
              {...register('name')}
              error={Boolean(formState.errors.name)}
              helperText={formState.errors.name?.message}
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={save.isPending}>
            {unit ? 'Rename' : 'Add unit'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
