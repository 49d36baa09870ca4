import {
  Alert,
  Button,
  CircularProgress,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  TextField,
} from '@mui/material';
import { monthSchema, type TrendsFilter } from '@upstroke/contracts';
import { useState } from 'react';
import { downloadMonthlyReport } from '../api/download-monthly-report';

/** The month before the current one (UTC), the month a committee usually reviews. */
export function lastMonth(now = new Date()): string {
  const d = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - 1, 1));
  return d.toISOString().slice(0, 7);
}

/** "Monthly report": pick a month, download the committee PDF with the page's filters. */
export function MonthlyReportButton({ filter }: { filter: TrendsFilter }) {
  const [open, setOpen] = useState(false);
  const [month, setMonth] = useState(lastMonth);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const parsed = monthSchema.safeParse(month);
  const invalid = parsed.success ? null : (parsed.error.issues[0]?.message ?? 'Pick a month');
  const close = () => {
    if (busy) return;
    setOpen(false);
    setError(null);
  };
  const download = async () => {
    setBusy(true);
    setError(null);
    try {
      await downloadMonthlyReport(month, filter);
      setOpen(false);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The report could not be made.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <>
      <Button variant="outlined" onClick={() => setOpen(true)}>
        Monthly report
      </Button>
      <Dialog open={open} onClose={close} aria-labelledby="monthly-report-title">
        <DialogTitle id="monthly-report-title">Monthly committee report</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>
            A PDF with the control charts of the 12 months to this month, their signals, the
            month&apos;s Utstein summary and review queue, for the site and unit filters above.
          </DialogContentText>
          <TextField
            type="month"
            label="Report month"
            value={month}
            onChange={(e) => setMonth(e.target.value)}
            error={Boolean(invalid)}
            helperText={invalid ?? 'Calendar month in UTC'}
            slotProps={{ inputLabel: { shrink: true } }}
            fullWidth
          />
          {error ? (
            <Alert severity="error" sx={{ mt: 2 }}>
              {error}
            </Alert>
          ) : null}
        </DialogContent>
        <DialogActions>
          <Button onClick={close} disabled={busy}>
            Cancel
          </Button>
          <Button
            variant="contained"
            onClick={() => void download()}
            disabled={busy || Boolean(invalid)}
            startIcon={busy ? <CircularProgress size={16} aria-hidden /> : null}
          >
            {busy ? 'Preparing PDF…' : 'Download PDF'}
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
