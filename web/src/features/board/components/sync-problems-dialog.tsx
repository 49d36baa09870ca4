import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  List,
  ListItem,
  ListItemText,
  Typography,
} from '@mui/material';
import { useLiveQuery } from 'dexie-react-hooks';
import { useState } from 'react';
import { Loading } from '../../../components/ui/states';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { listSyncProblems, offlineDb, retrySyncProblems } from '../../../lib/offline';
import { DiscardRefused } from './discard-refused';

const opText = { create: 'Starting the record', patch: 'Record details or team' } as const;

/** What the server did not accept: shown, kept on the tablet, and sent again on request. */
export function SyncProblemsDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const { dateTime } = useDisplayFormat();
  const problems = useLiveQuery(async () => {
    if (!open) return undefined;
    const found = await listSyncProblems(offlineDb);
    const ids = [...new Set([...found.ops, ...found.items].map((x) => x.resuscitationId))];
    const records = await offlineDb.resuscitations.bulkGet(ids);
    // Which code each entry belongs to, in words where this tablet knows the record.
    const names = new Map(
      ids.map((id, i) => {
        const r = records[i];
        const name = r
          ? `code of ${dateTime(r.arrestAt)}${r.location ? `, ${r.location}` : ''}`
          : `record ${id.slice(0, 8)}`;
        return [id, name];
      }),
    );
    return { ...found, names };
  }, [open, dateTime]);
  const [retried, setRetried] = useState<number | null>(null);
  const retry = async () => setRetried(await retrySyncProblems(offlineDb));
  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="md" aria-labelledby="sync-problems">
      <DialogTitle id="sync-problems">Not accepted by the server</DialogTitle>
      <DialogContent>
        <Typography sx={{ mb: 1 }}>
          These entries are kept on this tablet, unchanged. Check the reason; once it is fixed (for
          example, access to the site is granted), send them again.
        </Typography>
        {retried !== null && (
          <Alert severity="info" sx={{ mb: 1 }} role="status">
            {retried} sent back to the queue. The sync indicator shows their progress.
          </Alert>
        )}
        {!problems ? (
          <Loading label="Reading this tablet's store…" />
        ) : problems.ops.length + problems.items.length === 0 ? (
          <Typography color="text.secondary">Nothing is waiting here: all accepted.</Typography>
        ) : (
          <List dense aria-label="Entries not accepted">
            {problems.ops.map((o) => (
              <ListItem key={`op-${o.seq}`} disableGutters>
                <ListItemText
                  primary={`${opText[o.op]} · ${problems.names.get(o.resuscitationId)} · ${dateTime(new Date(o.createdAt).toISOString())}`}
                  secondary={`${o.reason}${o.op === 'create' && problems.heldBack ? ` — ${problems.heldBack} entries wait for it` : ''}`}
                />
              </ListItem>
            ))}
            {problems.items.map((i) => (
              <ListItem key={i.id} disableGutters>
                <ListItemText
                  primary={`${i.label} (${i.what}) · ${problems.names.get(i.resuscitationId)} · ${i.at ? dateTime(i.at) : ''}`}
                  secondary={i.reason || 'No reason given'}
                />
              </ListItem>
            ))}
          </List>
        )}
        <DiscardRefused count={problems?.items.length ?? 0} />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
        <Button
          variant="contained"
          onClick={() => void retry()}
          disabled={!problems || problems.ops.length + problems.items.length === 0}
        >
          Send again
        </Button>
      </DialogActions>
    </Dialog>
  );
}
