import { Alert, Button, Stack, TextField } from '@mui/material';
import { useState } from 'react';
import { apiTransport, discardRefused, offlineDb } from '../../lib/offline';

/**
 * For a lead: give up on the refused entries (of one record, or all), saying why. The
 * server's audit log keeps who, what and why first; then the tablet takes them out of its
 * outbox (kept in its store, marked discarded). Never silent.
 */
export function DiscardRefused({ count, recordId }: { count: number; recordId?: string }) {
  const [reason, setReason] = useState('');
  const [result, setResult] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  if (count === 0 && !result) return null;
  const tooShort = reason.trim().length < 3;
  const discard = async () => {
    setBusy(true);
    try {
      const n = await discardRefused(offlineDb, apiTransport, reason.trim(), recordId);
      setResult({ ok: true, text: `${n} discarded; the audit log records your reason.` });
      setReason('');
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      setResult({ ok: false, text: `Not discarded (${why}); the entries are kept as they were.` });
    } finally {
      setBusy(false);
    }
  };
  return (
    <Stack spacing={1} sx={{ mt: 2 }}>
      {result && (
        <Alert severity={result.ok ? 'success' : 'error'} role="status">
          {result.text}
        </Alert>
      )}
      {count > 0 && (
        <Stack
          direction={{ xs: 'column', sm: 'row' }}
          spacing={1}
          sx={{ alignItems: 'flex-start' }}
        >
          <TextField
            label="Why discard the refused entries (lead)"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            size="small"
            fullWidth
            slotProps={{ htmlInput: { maxLength: 500 } }}
            helperText="Recorded in the audit log with your name and each entry's content"
          />
          <Button
            color="warning"
            variant="outlined"
            disabled={tooShort || busy}
            onClick={() => void discard()}
            sx={{ minHeight: 40, whiteSpace: 'nowrap' }}
          >
            Discard {count} refused
          </Button>
        </Stack>
      )}
    </Stack>
  );
}
