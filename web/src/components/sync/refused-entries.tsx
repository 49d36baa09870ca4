import { Alert, Button, List, ListItem, ListItemText, Stack, Typography } from '@mui/material';
import { useLiveQuery } from 'dexie-react-hooks';
import { useState } from 'react';
import { useAuth } from '../../hooks/use-auth';
import { useDisplayFormat } from '../../hooks/use-display-format';
import {
  listSyncProblems,
  offlineDb,
  retrySyncProblems,
  type SyncProblems,
} from '../../lib/offline';
import { Loading } from '../ui/states';
import { DiscardRefused } from './discard-refused';

const opText = { create: 'Starting the record', patch: 'Record details or team' } as const;

export type NamedProblems = SyncProblems & { names: Map<string, string> };

/** What the server refused (of one record, or all), with each record named in words. */
export function useSyncProblems(recordId?: string): NamedProblems | undefined {
  const { dateTime } = useDisplayFormat();
  return useLiveQuery(async () => {
    const all = await listSyncProblems(offlineDb);
    const mine = (x: { resuscitationId: string }) => !recordId || x.resuscitationId === recordId;
    const found = { ...all, ops: all.ops.filter(mine), items: all.items.filter(mine) };
    const ids = [...new Set([...found.ops, ...found.items].map((x) => x.resuscitationId))];
    const records = await offlineDb.resuscitations.bulkGet(ids);
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
  }, [recordId, dateTime]);
}

function ProblemList({ problems }: { problems: NamedProblems }) {
  const { dateTime } = useDisplayFormat();
  return (
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
  );
}

/**
 * The entries the server did not accept, kept on this tablet unchanged, with their reasons.
 * Everyone sees them; only a lead resolves them: send again, or discard with a reason
 * (audited on the server). `recordId` limits the list and the actions to one record.
 */
export function RefusedEntries({ recordId }: { recordId?: string }) {
  const { hasRole } = useAuth();
  const lead = hasRole('lead');
  const problems = useSyncProblems(recordId);
  const [retried, setRetried] = useState<number | null>(null);
  if (!problems) return <Loading label="Reading this tablet's store…" />;
  const count = problems.ops.length + problems.items.length;
  return (
    <Stack spacing={1}>
      {retried !== null && (
        <Alert severity="info" role="status">
          {retried} sent back to the queue. The sync indicator shows their progress.
        </Alert>
      )}
      {count === 0 ? (
        <Typography color="text.secondary">Nothing is waiting here: all accepted.</Typography>
      ) : (
        <ProblemList problems={problems} />
      )}
      {count > 0 && !lead && (
        <Typography variant="body2" color="text.secondary">
          Only a lead can send these again or discard them: ask the lead of the code.
        </Typography>
      )}
      {count > 0 && lead && (
        <Button
          variant="contained"
          onClick={() => void retrySyncProblems(offlineDb, recordId).then(setRetried)}
          sx={{ alignSelf: 'flex-start', minHeight: 40 }}
        >
          Send again
        </Button>
      )}
      {lead && <DiscardRefused count={count} recordId={recordId} />}
    </Stack>
  );
}
