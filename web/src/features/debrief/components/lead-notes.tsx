import { Alert, Button, Stack, TextField, Typography } from '@mui/material';
import type { DebriefRecord } from '@upstroke/contracts';
import { useState } from 'react';
import { useUpdateClosing } from '../api/sign-resuscitation';

/** What went well / what to change: the lead writes them until the record is signed. */
export function LeadNotes({ record, canEdit }: { record: DebriefRecord; canEdit: boolean }) {
  const [wentWell, setWentWell] = useState(record.notesWentWell ?? '');
  const [toChange, setToChange] = useState(record.notesToChange ?? '');
  const save = useUpdateClosing(record.id);
  const editable = canEdit && record.status !== 'signed';
  return (
    <Stack spacing={2} component="section" aria-label="Lead notes">
      <TextField
        label="What went well"
        multiline
        minRows={2}
        value={wentWell}
        disabled={!editable}
        onChange={(e) => setWentWell(e.target.value)}
        slotProps={{ htmlInput: { maxLength: 5000 } }}
      />
      <TextField
        label="What to change"
        multiline
        minRows={2}
        value={toChange}
        disabled={!editable}
        onChange={(e) => setToChange(e.target.value)}
        slotProps={{ htmlInput: { maxLength: 5000 } }}
      />
      {editable && (
        <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
          <Button
            variant="outlined"
            sx={{ minHeight: 48 }}
            disabled={save.isPending}
            onClick={() =>
              save.mutate({ notesWentWell: wentWell || null, notesToChange: toChange || null })
            }
          >
            Save notes
          </Button>
          {save.isSuccess && (
            <Typography role="status" color="text.secondary">
              Notes saved.
            </Typography>
          )}
        </Stack>
      )}
      {save.error && <Alert severity="error">{save.error.message}</Alert>}
    </Stack>
  );
}
