import {
  Alert,
  Button,
  Checkbox,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  FormControlLabel,
  List,
  ListItem,
  ListItemText,
  Typography,
} from '@mui/material';
import { useLiveQuery } from 'dexie-react-hooks';
import { useState } from 'react';
import { listSyncProblems, offlineDb } from '../../../lib/offline';

interface Props {
  resuscitationId: string;
  /** Closing details still empty, in words ("Outcome", "First documented rhythm"…). */
  missing: string[];
  pending: boolean;
  onConfirm: () => void;
  onClose: () => void;
}

/** Entries of this record the server refused, still on this tablet. */
function useRefusedHere(id: string): number | undefined {
  return useLiveQuery(async () => {
    const p = await listSyncProblems(offlineDb);
    return [...p.items, ...p.ops].filter((x) => x.resuscitationId === id).length;
  }, [id]);
}

/**
 * Signing with intent: what signing means, what is still unresolved, and an explicit
 * confirmation. Missing closing details block signing; refused entries are named so the lead
 * can resolve them first (send again or discard with a reason, in the Debrief's "Not accepted
 * by the server" section or from the top bar).
 */
export function SignDialog({ resuscitationId, missing, pending, onConfirm, onClose }: Props) {
  const refused = useRefusedHere(resuscitationId) ?? 0;
  const [sure, setSure] = useState(false);
  const unresolved = [
    ...missing.map((m) => `${m}: not recorded (needed to sign)`),
    ...(refused > 0
      ? [
          `${refused} ${refused === 1 ? 'entry' : 'entries'} on this tablet not accepted by the server: they will not be part of the signed record`,
        ]
      : []),
  ];
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="sign-title">
      <DialogTitle id="sign-title">Sign and lock this record?</DialogTitle>
      <DialogContent>
        <DialogContentText>
          Signing locks the record as the chart copy under your name. After signing, nothing can be
          edited: a change is made only as an amendment with a reason, shown with your name and the
          time on the debrief, the PDF and the FHIR export.
        </DialogContentText>
        <Typography variant="subtitle2" sx={{ mt: 2 }}>
          Unresolved items
        </Typography>
        {unresolved.length === 0 ? (
          <Typography variant="body2" color="text.secondary">
            None: the closing details are complete and every entry on this tablet was accepted.
          </Typography>
        ) : (
          <List dense aria-label="Unresolved items">
            {unresolved.map((u) => (
              <ListItem key={u} disableGutters>
                <ListItemText primary={u} />
              </ListItem>
            ))}
          </List>
        )}
        {missing.length > 0 && (
          <Alert severity="warning" sx={{ mt: 1 }}>
            Complete the closing details before signing.
          </Alert>
        )}
        <FormControlLabel
          sx={{ mt: 1 }}
          control={<Checkbox checked={sure} onChange={(e) => setSure(e.target.checked)} />}
          label="I have reviewed this record and it is ready to sign"
        />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} sx={{ minHeight: 48 }}>
          Cancel
        </Button>
        <Button
          variant="contained"
          disabled={!sure || missing.length > 0 || pending}
          onClick={onConfirm}
          sx={{ minHeight: 48 }}
        >
          Sign and lock
        </Button>
      </DialogActions>
    </Dialog>
  );
}
