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
import { sendDebriefEmailSchema } from '@upstroke/contracts';
import { useState } from 'react';
import { useSendDebriefEmail } from '../api/send-debrief-email';

/** Sends the debrief summary, a link and the PDF to the chosen team members. */
export function EmailDialog({ id, onClose }: { id: string; onClose: () => void }) {
  const [to, setTo] = useState('');
  const [message, setMessage] = useState('');
  const [invalid, setInvalid] = useState<string | null>(null);
  const send = useSendDebriefEmail(id);
  const submit = () => {
    const recipients = to.split(/[\s,;]+/).filter(Boolean);
    const parsed = sendDebriefEmailSchema.safeParse({ recipients, message: message || undefined });
    if (!parsed.success)
      return setInvalid(parsed.error.issues[0]?.message ?? 'Check the addresses');
    setInvalid(null);
    send.mutate(parsed.data);
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="email-title">
      <DialogTitle id="email-title">E-mail the debrief</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          <TextField
            label="Recipients"
            helperText="E-mail addresses, separated by commas"
            value={to}
            onChange={(e) => setTo(e.target.value)}
            error={Boolean(invalid)}
          />
          <TextField
            label="Message (optional)"
            multiline
            minRows={2}
            value={message}
            onChange={(e) => setMessage(e.target.value)}
          />
          {invalid && <Alert severity="error">{invalid}</Alert>}
          {send.error && <Alert severity="error">{send.error.message}</Alert>}
          {send.data && (
            <Alert severity={send.data.status === 'sent' ? 'success' : 'info'} role="status">
              {send.data.status === 'sent'
                ? 'Sent with the PDF attached.'
                : 'Queued: the mail server did not answer; it will be retried.'}
            </Alert>
          )}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} sx={{ minHeight: 48 }}>
          Close
        </Button>
        <Button
          variant="contained"
          onClick={submit}
          disabled={send.isPending || Boolean(send.data)}
          sx={{ minHeight: 48 }}
        >
          Send
        </Button>
      </DialogActions>
    </Dialog>
  );
}
