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
import {
  mailDomainIssues,
  type RosterMember,
  rosterRoleLabel,
  type SendDebriefEmail,
  sendDebriefEmailSchema,
} from '@upstroke/contracts';
import { useState } from 'react';
import { useEmailContext } from '../api/email-context';
import { useSendDebriefEmail } from '../api/send-debrief-email';

/** The ticked team members and the typed addresses, each once (case aside). */
function recipientsOf(ticked: string[], typed: string): string[] {
  const seen = new Set<string>();
  return [...ticked, ...typed.split(/[\s,;]+/).filter(Boolean)].filter((e) => {
    const key = e.toLowerCase();
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** The body to send, or the message saying what to put right (format, then domains). */
export function checkRecipients(
  recipients: string[],
  message: string,
  domains: readonly string[],
): { body: SendDebriefEmail } | { problem: string } {
  const parsed = sendDebriefEmailSchema.safeParse({ recipients, message: message || undefined });
  if (!parsed.success) return { problem: parsed.error.issues[0]?.message ?? 'Check the addresses' };
  const outside = mailDomainIssues(recipients, domains);
  if (outside.length > 0) return { problem: outside.map((i) => i.message).join('; ') };
  return { body: parsed.data };
}

function TeamChoices(props: {
  members: RosterMember[];
  unticked: ReadonlySet<string>;
  onToggle: (email: string) => void;
}) {
  return (
    <FormGroup aria-labelledby="email-team">
      <FormLabel id="email-team">Team present</FormLabel>
      {props.members.map((m) => (
        <FormControlLabel
          key={m.email}
          sx={{ minHeight: 48 }}
          label={`${m.name} (${rosterRoleLabel(m.role)}) · ${m.email}`}
          control={
            <Checkbox
              checked={!props.unticked.has(m.email as string)}
              onChange={() => props.onToggle(m.email as string)}
            />
          }
        />
      ))}
    </FormGroup>
  );
}

/**
 * Sends the debrief summary, a link and the PDF: the team members with an e-mail address
 * are offered (all ticked), and other addresses within the organisation's domains can be added.
 */
export function EmailDialog({ id, onClose }: { id: string; onClose: () => void }) {
  const [to, setTo] = useState('');
  const [message, setMessage] = useState('');
  const [invalid, setInvalid] = useState<string | null>(null);
  const [unticked, setUnticked] = useState<ReadonlySet<string>>(new Set());
  const ctx = useEmailContext(id);
  const send = useSendDebriefEmail(id);
  const toggle = (email: string) =>
    setUnticked((u) => {
      const next = new Set(u);
      if (!next.delete(email)) next.add(email);
      return next;
    });
  const submit = () => {
    const ticked = ctx.members.map((m) => m.email as string).filter((e) => !unticked.has(e));
    const checked = checkRecipients(recipientsOf(ticked, to), message, ctx.domains);
    if ('problem' in checked) return setInvalid(checked.problem);
    setInvalid(null);
    send.mutate(checked.body);
  };
  const hint = ctx.domains.length
    ? `Addresses at ${ctx.domains.join(', ')} only, separated by commas`
    : 'E-mail addresses, separated by commas';
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="email-title">
      <DialogTitle id="email-title">E-mail the debrief</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          {!ctx.loading && !ctx.signed && (
            <Alert severity="info">
              This record is not signed: the subject says “Draft — not signed”.
            </Alert>
          )}
          {ctx.members.length > 0 ? (
            <TeamChoices members={ctx.members} unticked={unticked} onToggle={toggle} />
          ) : (
            !ctx.loading && (
              <Typography color="text.secondary">
                No team member of this record has an e-mail address (the team is entered under Team
                on Live during the code). Type the addresses below.
              </Typography>
            )
          )}
          <TextField
            label={ctx.members.length ? 'Other recipients' : 'Recipients'}
            helperText={invalid ?? hint}
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
