import { Alert, Pagination, Paper, Stack, Typography } from '@mui/material';
import type { ResuscitationListItem } from '@upstroke/contracts';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import type { LocalResuscitation } from '../../../lib/offline';
import { PAGE_SIZE, useResuscitationSearch } from '../api/list-resuscitations';
import { apiQuery, isFiltered, useRecordFilters } from '../hooks/use-record-filters';
import { useRecordingContext } from '../hooks/use-recording-context';
import { RecordFiltersBar } from './record-filters';
import { RecordRows, type RecordRow } from './record-list';

/**
 * The server's page of records, led (on the first unfiltered page) by this device's ended
 * codes that it does not hold yet (not synced, or offline). A code that has ended opens in
 * Debrief; only a running one opens in Live, and only for those who record.
 */
export function recordRows(
  local: LocalResuscitation[],
  server: ResuscitationListItem[],
  canRecord: boolean,
  withLocal: boolean,
): RecordRow[] {
  const endedHere = new Set(local.filter((r) => r.status !== 'open').map((r) => r.id));
  const onServer = new Set(server.map((r) => r.id));
  const running = (r: { id: string; status: string }) =>
    r.status === 'open' && !endedHere.has(r.id);
  const localRows = withLocal
    ? local
        .filter((r) => endedHere.has(r.id) && !onServer.has(r.id))
        .map((r) => ({ id: r.id, arrestAt: r.arrestAt, status: r.status, detail: r.location }))
    : [];
  return [
    ...localRows,
    ...server.map((r) => ({
      id: r.id,
      arrestAt: r.arrestAt,
      status: endedHere.has(r.id) && r.status === 'open' ? 'closed' : r.status,
      detail: [r.unitName, r.location].filter(Boolean).join(' · ') || undefined,
    })),
  ].map((r) => ({ ...r, to: running(r) && canRecord ? `/live/${r.id}` : `/debrief/${r.id}` }));
}

/** Records on the user's sites: search, filters (kept in the URL) and pages. */
export function RecordsPanel({
  local,
  canRecord,
}: {
  local: LocalResuscitation[];
  canRecord: boolean;
}) {
  const { filters, page, setFilters, setPage, clear } = useRecordFilters();
  const { sites } = useRecordingContext();
  const { display } = useDisplayFormat();
  const search = useResuscitationSearch(apiQuery(filters, display.timeZone), page);
  const filtered = isFiltered(filters);
  const rows = recordRows(local, search.data?.items ?? [], canRecord, !filtered && page === 0);
  const pages = Math.ceil((search.data?.total ?? 0) / PAGE_SIZE);
  return (
    <Paper
      variant="outlined"
      sx={{ p: 1.5 }}
      component="section"
      aria-label="Records on your sites"
    >
      <Typography variant="h2" sx={{ mb: 1.5 }}>
        Records on your sites
      </Typography>
      <RecordFiltersBar
        key={filters.q}
        filters={filters}
        sites={sites}
        onChange={setFilters}
        onClear={clear}
      />
      {search.isError && (
        <Alert severity="info" sx={{ mt: 1.5 }}>
          The records on your sites show when the network is back.
        </Alert>
      )}
      <Stack spacing={1} sx={{ mt: 1.5 }}>
        {search.data && (
          <Typography variant="body2" color="text.secondary" aria-live="polite">
            {search.data.total === 1 ? '1 record' : `${search.data.total} records`}
            {filtered ? (search.data.total === 1 ? ' matches' : ' match') : ''}
          </Typography>
        )}
        <RecordRows
          label="Records on your sites"
          rows={rows}
          empty={
            search.isPending ? 'Loading…' : filtered ? 'No record matches.' : 'No records yet.'
          }
        />
        {pages > 1 && (
          <Pagination
            count={pages}
            page={page + 1}
            onChange={(_, p) => setPage(p - 1)}
            getItemAriaLabel={(type, p) =>
              type === 'page' ? `Page ${p}` : type === 'next' ? 'Next page' : 'Previous page'
            }
          />
        )}
      </Stack>
    </Paper>
  );
}
