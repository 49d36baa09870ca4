import { Stack } from '@mui/material';
import { useLiveQuery } from 'dexie-react-hooks';
import { ClinicalCaution } from '../../../components/ui/clinical-caution';
import { PageHeader } from '../../../components/ui/states';
import { offlineDb } from '../../../lib/offline';
import { useAuth } from '../../../hooks/use-auth';
import { RecordList } from './record-list';
import { RecordsPanel } from './records-panel';
import { StartPanel } from './start-panel';

/** Home: Start, the codes in progress on this device, and recent ones on the user's sites. */
export function BoardPage() {
  const { hasRole } = useAuth();
  const canRecord = hasRole('recorder', 'lead');
  const local = useLiveQuery(
    () => offlineDb.resuscitations.where('local').equals(1).reverse().sortBy('createdAt'),
    [],
    [],
  );
  const inProgress = local.filter((r) => r.status === 'open');
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
      <RecordsPanel local={local} canRecord={canRecord} />
      <ClinicalCaution />
    </Stack>
  );
}
