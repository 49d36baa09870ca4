import AttachFile from '@mui/icons-material/AttachFile';
import {
  Box,
  Chip,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  Stack,
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

const sizeText = (bytes: number) =>
  bytes < 1024 ? `${bytes} B` : `${Math.round(bytes / 1024).toLocaleString()} KB`;

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
            {message.data.attachments.length > 0 && (
              <Stack
                direction="row"
                component="ul"
                aria-label="Attachments"
                sx={{ flexWrap: 'wrap', gap: 1, p: 0, my: 1, listStyle: 'none' }}
              >
                {message.data.attachments.map((a, i) => (
                  <li key={i}>
                    <Chip
                      icon={<AttachFile />}
                      label={`${a.filename ?? 'Unnamed attachment'} · ${a.contentType} · ${sizeText(a.sizeBytes)}`}
                    />
                  </li>
                ))}
              </Stack>
            )}
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
