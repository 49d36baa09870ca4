import {
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  Typography,
} from '@mui/material';
import { ErrorState, Loading } from '../../../components/ui/states';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { useMailMessage } from '../api/list-mail';

/** The text with its web addresses as links (set-password links are opened from here). */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <Box
      component="pre"
      sx={{ whiteSpace: 'pre-wrap', wordBreak: 'break-all', fontFamily: 'inherit', m: 0 }}
    >
      {parts.map((p, i) =>
        i % 2 === 1 ? (
          <Link key={i} href={p}>
            {p}
          </Link>
        ) : (
          p
        ),
      )}
    </Box>
  );
}

export function MailMessageDialog({ id, onClose }: { id: number; onClose: () => void }) {
  const message = useMailMessage(id);
  const { dateTime } = useDisplayFormat();
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md" aria-labelledby="mail-dialog-title">
      <DialogTitle id="mail-dialog-title">{message.data?.subject ?? 'Message'}</DialogTitle>
      <DialogContent>
        {message.isPending && <Loading label="Loading message…" />}
        {message.isError && <ErrorState error={message.error} />}
        {message.data && (
          <>
            <Typography color="text.secondary" gutterBottom>
              To {message.data.to.join(', ')} · from {message.data.from ?? '—'} ·{' '}
              {dateTime(message.data.receivedAt)}
            </Typography>
            <Linkified text={message.data.text || '(no plain-text part)'} />
          </>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
