import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Typography,
} from '@mui/material';
import { RefusedEntries } from '../../../components/sync/refused-entries';

/** What the server did not accept: shown, kept on the tablet, resolved by a lead. */
export function SyncProblemsDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="md" aria-labelledby="sync-problems">
      <DialogTitle id="sync-problems">Not accepted by the server</DialogTitle>
      <DialogContent>
        <Typography sx={{ mb: 1 }}>
          These entries are kept on this tablet, unchanged. Check the reason; once it is fixed (for
          example, access to the site is granted), a lead sends them again, or discards them with a
          reason.
        </Typography>
        {open && <RefusedEntries />}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
