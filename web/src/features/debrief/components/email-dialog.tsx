import {
  Alert,
  Button,
  Checkbox,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  FormGroup,
  FormLabel,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useQuery } from '@tanstack/react-query';
import { resuscitationSchema, rosterRoleLabel, sendDebriefEmailSchema } from '@upstroke/contracts';
import { useState } from 'react';
import { apiFetch } from '../../../lib/api-client';
import { useSendDebriefEmail } from '../api/send-debrief-email';

/** The record's team as entered on Live or the Board (the same query as Live's). */
function useTeam(id: string) {
  const record = useQuery({
    queryKey: ['resuscitations', id, 'summary'],
    queryFn: () => apiFetch(`/resuscitations/${id}`, { schema: resuscitationSchema }),
  });
  const members = (record.data?.roster ?? []).filter((m) => m.email);
  return { members, loading: record.isPending };
}

/**
 * Sends the debrief summary, a link and the PDF: the team members with an e-mail address
 * are offered (all ticked), and other addresses can be added.
 */
export function EmailDialog({ id, onClose }: { id: string; onClose: () => void }) {
  const [to, setTo] = useState('');
  const [message, setMessage] = useState('');
  const [invalid, setInvalid] = useState<string | null>(null);
  const [unticked, setUnticked] = useState<ReadonlySet<string>>(new Set());
  const team = useTeam(id);
  const send = useSendDebriefEmail(id);
  const toggle = (email: string) =>
    setUnticked((u) => {
      const next = new Set(u);
      if (next.has(email)) next.delete(email);
      else next.add(email);
      return next;
    });
  const submit = () => {
    const typed = to.split(/[\s,;]+/).filter(Boolean);
    const ticked = team.members.map((m) => m.email as string).filter((e) => !unticked.has(e));
    const seen = new Set<string>();
    const recipients = [...ticked, ...typed].filter((e) => {
      const key = e.toLowerCase();
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
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
          {team.members.length > 0 ? (
            <FormGroup aria-labelledby="email-team">
              <FormLabel id="email-team">Team present</FormLabel>
              {team.members.map((m) => (
                <FormControlLabel
                  key={m.email}
                  sx={{ minHeight: 48 }}
                  label={`${m.name} (${rosterRoleLabel(m.role)}) · ${m.email}`}
                  control={
                    <Checkbox
                      checked={!unticked.has(m.email as string)}
                      onChange={() => toggle(m.email as string)}
                    />
                  }
                />
              ))}
            </FormGroup>
          ) : (
            !team.loading && (
              <Typography color="text.secondary">
                No team member has an e-mail address yet: add them under Team on Live or the Board
                to offer them here.
              </Typography>
            )
          )}
          <TextField
            label={team.members.length ? 'Other recipients' : 'Recipients'}
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
