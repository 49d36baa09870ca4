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
import { type DebriefRecord, outcomeLabels } from '@upstroke/contracts';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { useAmend } from '../api/sign-resuscitation';

const formSchema = z.object({
  reason: z.string().trim().min(1, 'A reason is required').max(2000),
  outcome: z.string(),
  note: z.string().max(2000),
});
type Form = z.infer<typeof formSchema>;

/** A correction after signing: a reason is required; it changes the outcome or adds a note. */
export function AmendDialog({ record, onClose }: { record: DebriefRecord; onClose: () => void }) {
  const amend = useAmend(record.id);
  const { register, handleSubmit, formState, watch } = useForm<Form>({
    resolver: zodResolver(formSchema),
    defaultValues: { reason: '', outcome: record.outcome ?? '', note: '' },
  });
  const submit = handleSubmit((f) => {
    const fields =
      f.outcome && f.outcome !== record.outcome
        ? { outcome: f.outcome as DebriefRecord['outcome'] }
        : undefined;
    const events = f.note.trim()
      ? [
          {
            id: crypto.randomUUID(),
            at: new Date().toISOString(),
            kind: 'note' as const,
            data: { text: f.note.trim() },
          },
        ]
      : undefined;
    amend.mutate({ reason: f.reason, fields, events }, { onSuccess: onClose });
  });
  const changes = watch('note').trim() !== '' || watch('outcome') !== (record.outcome ?? '');
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="amend-title">
      <form onSubmit={(e) => void submit(e)} noValidate>
        <DialogTitle id="amend-title">Amend the signed record</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            <TextField
              label="Reason for the amendment"
              required
              multiline
              minRows={2}
              {...register('reason')}
              error={Boolean(formState.errors.reason)}
              helperText={
                formState.errors.reason?.message ??
                'Shown in the record and the PDF with your name and the time.'
              }
            />
            <TextField
              select
              label="Outcome"
              defaultValue={record.outcome ?? ''}
              {...register('outcome')}
            >
              <MenuItem value="">Not recorded</MenuItem>
              {Object.entries(outcomeLabels).map(([v, l]) => (
                <MenuItem key={v} value={v}>
                  {l}
                </MenuItem>
              ))}
            </TextField>
            <TextField
              label="Add a note to the record"
              multiline
              minRows={2}
              {...register('note')}
            />
            {amend.error && <Alert severity="error">{amend.error.message}</Alert>}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose} sx={{ minHeight: 48 }}>
            Cancel
          </Button>
          <Button
            type="submit"
            variant="contained"
            disabled={amend.isPending || !changes}
            sx={{ minHeight: 48 }}
          >
            Save amendment
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
