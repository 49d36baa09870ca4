import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { MAX_EARLIER_MIN } from '../lib/arrest-time';

const quick = [1, 2, 3, 5, 10];

/** "The arrest was N min before Start", recorded as a correction with its reason. */
export function ArrestTimeDialog(props: {
  open: boolean;
  /** The Start tap (what N minutes are counted back from). */
  startAt: string;
  onSave: (minutes: number, reason: string) => void;
  onClose: () => void;
}) {
  const [minutes, setMinutes] = useState('');
  const [reason, setReason] = useState('');
  const n = Number(minutes);
  const badMinutes = minutes !== '' && !(Number.isInteger(n) && n >= 0 && n <= MAX_EARLIER_MIN);
  const ready = minutes !== '' && !badMinutes && reason.trim() !== '';
  const start = useDisplayFormat().time(props.startAt, true);
  return (
    <Dialog open={props.open} onClose={props.onClose} aria-labelledby="arrest-time-title">
      <DialogTitle id="arrest-time-title">Arrest time</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          <Typography>The arrest was this many minutes before Start ({start}):</Typography>
          <Stack direction="row" sx={{ gap: 1, flexWrap: 'wrap' }}>
            {quick.map((q) => (
              <Button
                key={q}
                variant={minutes === String(q) ? 'contained' : 'outlined'}
                onClick={() => setMinutes(String(q))}
                sx={{ minHeight: 56, minWidth: 72 }}
              >
                {q} min
              </Button>
            ))}
          </Stack>
          <TextField
            label="Minutes before Start"
            inputMode="numeric"
            value={minutes}
            onChange={(e) => setMinutes(e.target.value.trim())}
            error={badMinutes}
            helperText={badMinutes ? `A whole number from 0 to ${MAX_EARLIER_MIN}` : ' '}
          />
          <TextField
            label="Reason"
            required
            value={reason}
            onChange={(e) => setReason(e.target.value.slice(0, 500))}
            helperText="Kept with the record as the reason for the correction"
          />
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={props.onClose} sx={{ minHeight: 56 }}>
          Cancel
        </Button>
        <Button
          variant="contained"
          disabled={!ready}
          onClick={() => props.onSave(n, reason.trim())}
          sx={{ minHeight: 56 }}
        >
          Set arrest time
        </Button>
      </DialogActions>
    </Dialog>
  );
}
