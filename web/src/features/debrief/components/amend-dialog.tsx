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
import { type DebriefEvent, type DebriefRecord, outcomeLabels } from '@upstroke/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { useAmend } from '../api/sign-resuscitation';
import { EventCorrection, type EventFix, fixProblem } from './event-correction';

const formSchema = z.object({
  reason: z.string().trim().min(1, 'A reason is required').max(2000),
  outcome: z.string(),
  note: z.string().max(2000),
});
type Form = z.infer<typeof formSchema>;

/** A correction of a signed event: the event struck through, its replacement (time and detail). */
function correctionEvent(events: DebriefEvent[], fix: EventFix | null, reason: string) {
  const old = fix && events.find((e) => e.id === fix.eventId);
  if (!fix || !old) return [];
  const data = Object.fromEntries(Object.entries(fix.data).filter(([, v]) => v !== undefined));
  const moved = Date.parse(fix.at) !== Date.parse(old.at);
  if (!moved && JSON.stringify(data) === JSON.stringify(old.data)) return [];
  const replacement = { kind: old.kind, data, at: moved ? fix.at : old.at };
  return [
    {
      id: crypto.randomUUID(),
      at: new Date().toISOString(),
      kind: 'correction' as const,
      data: { supersedes: old.id, reason, replacement },
    },
  ];
}

/**
 * A correction after signing: a reason is required; it corrects an event (its time, route
 * and dose, rhythm or energy), changes the outcome or adds a note.
 */
export function AmendDialog({
  record,
  events: recorded,
  onClose,
}: {
  record: DebriefRecord;
  events: DebriefEvent[];
  onClose: () => void;
}) {
  const amend = useAmend(record.id);
  const [fix, setFix] = useState<EventFix | null>(null);
  const { register, handleSubmit, formState, watch } = useForm<Form>({
    resolver: zodResolver(formSchema),
    defaultValues: { reason: '', outcome: record.outcome ?? '', note: '' },
  });
  const submit = handleSubmit((f) => {
    const fields =
      f.outcome && f.outcome !== record.outcome
        ? { outcome: f.outcome as DebriefRecord['outcome'] }
        : undefined;
    const note = f.note.trim()
      ? [
          {
            id: crypto.randomUUID(),
            at: new Date().toISOString(),
            kind: 'note' as const,
            data: { text: f.note.trim() },
          },
        ]
      : [];
    const events = [...correctionEvent(recorded, fix, f.reason.trim()), ...note];
    amend.mutate(
      { reason: f.reason, fields, events: events.length ? events : undefined },
      { onSuccess: onClose },
    );
  });
  const changes =
    watch('note').trim() !== '' ||
    watch('outcome') !== (record.outcome ?? '') ||
    correctionEvent(recorded, fix, '').length > 0;
  const fixWrong = fix && fixProblem(fix, record.arrestAt);
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
            <EventCorrection
              events={recorded}
              arrestAt={record.arrestAt}
              fix={fix}
              onFix={setFix}
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
            disabled={amend.isPending || !changes || Boolean(fixWrong)}
            sx={{ minHeight: 48 }}
          >
            Save amendment
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
