import { Alert, Stack } from '@mui/material';
import { useLiveQuery } from 'dexie-react-hooks';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { PageHeader } from '../../../components/ui/states';
import type { Resuscitation } from '@upstroke/contracts';
import { type LocalResuscitation, offlineDb } from '../../../lib/offline';
import { useAuth } from '../../auth/use-auth';
import { useRecentResuscitations } from '../api/list-resuscitations';
import { RecordList, type RecordRow } from './record-list';
import { StartPanel } from './start-panel';

/**
 * Recent records: the server's list, with this device's ended codes that it does not hold yet
 * (not synced, or offline). A code that has ended opens in Debrief; only a running one in Live.
 */
function recentRows(
  local: LocalResuscitation[],
  server: Resuscitation[],
  canRecord: boolean,
): RecordRow[] {
  const endedHere = new Set(local.filter((r) => r.status !== 'open').map((r) => r.id));
  const onServer = new Set(server.map((r) => r.id));
  const running = (r: { id: string; status: string }) =>
    r.status === 'open' && !endedHere.has(r.id);
  return [
    ...local
      .filter((r) => endedHere.has(r.id) && !onServer.has(r.id))
      .map((r) => ({ id: r.id, arrestAt: r.arrestAt, status: r.status, detail: r.location })),
    ...server.map((r) => ({
      id: r.id,
      arrestAt: r.arrestAt,
      status: endedHere.has(r.id) && r.status === 'open' ? 'closed' : r.status,
      detail: r.location ?? undefined,
    })),
  ].map((r) => ({ ...r, to: running(r) && canRecord ? `/live/${r.id}` : `/debrief/${r.id}` }));
}

/** Home: Start, the codes in progress on this device, and recent ones on the user's sites. */
export function BoardPage() {
  const { hasRole } = useAuth();
  const canRecord = hasRole('recorder', 'lead');
  const local = useLiveQuery(
    () => offlineDb.resuscitations.where('local').equals(1).reverse().sortBy('createdAt'),
    [],
    [],
  );
  const recent = useRecentResuscitations();
  const inProgress = local.filter((r) => r.status === 'open');
  const rows = recentRows(local, recent.data?.items ?? [], canRecord);
  return (
    <Stack spacing={2}>
      <PageHeader title="Board" />
      {canRecord && <StartPanel />}
      {canRecord && (
        <RecordList
          title="In progress on this device"
          empty="No code in progress on this device."
          rows={inProgress.map((r) => ({
            id: r.id,
            arrestAt: r.arrestAt,
            status: r.status,
            detail: r.location,
            to: `/live/${r.id}`,
          }))}
        />
      )}
      {recent.isError && (
        <Alert severity="info">Recent records on your sites show when the network is back.</Alert>
      )}
      <RecordList
        title="Recent on your sites"
        empty={recent.isPending ? 'Loading…' : 'No records yet.'}
        rows={rows}
      />
      <ClinicalCaution />
    </Stack>
  );
}
