import Download from '@mui/icons-material/Download';
import { Alert, Button, Stack } from '@mui/material';
import { DataGrid, type GridColDef, type GridPaginationModel } from '@mui/x-data-grid';
import {
  type AuditEntry,
  auditActionLabels,
  auditEntityLabels,
  labelOf,
} from '@upstroke/contracts';
import { type Formatter, useDisplayFormat } from '../../../hooks/use-display-format';
import { useMemo, useState } from 'react';
import { ErrorState } from '../../../components/ui/states';
import { exportAudit } from '../api/export-audit';
import { type AuditFilters, useAudit } from '../api/list-audit';
import { apiErrorText } from './api-error';
import { auditDetailsText, type SiteNamer } from './audit-details';
import { AuditEntryDialog } from './audit-entry-dialog';
import { useSites } from '../api/list-sites';
import { siteNames } from './site-names';
import { AuditFilterBar } from './audit-filters';

const columnsFor = (
  f: Formatter,
  sites: SiteNamer,
  open: (e: AuditEntry) => void,
): GridColDef<AuditEntry>[] => [
  {
    field: 'at',
    headerName: 'When',
    width: 190,
    valueFormatter: (v: string) => f.dateTime(v),
  },
  {
    field: 'userName',
    headerName: 'Who',
    flex: 1,
    minWidth: 160,
    valueGetter: (_v, r) => r.userName ?? r.userEmail ?? '—',
  },
  {
    field: 'action',
    headerName: 'What',
    width: 190,
    valueGetter: (_v, r) => labelOf(auditActionLabels, r.action),
  },
  {
    field: 'entity',
    headerName: 'About',
    width: 140,
    valueGetter: (_v, r) => labelOf(auditEntityLabels, r.entity),
  },
  {
    field: 'details',
    headerName: 'Details',
    flex: 2,
    minWidth: 240,
    sortable: false,
    valueGetter: (_v, r) => auditDetailsText(r, sites),
  },
  {
    field: 'view',
    headerName: '',
    width: 100,
    sortable: false,
    renderCell: ({ row }) => (
      <Button
        onClick={() => open(row)}
        aria-label={`Details of ${labelOf(auditActionLabels, row.action)} at ${f.dateTime(row.at)}`}
      >
        Details
      </Button>
    ),
  },
];

const isUuid = (s?: string) => !s || /^[0-9a-f-]{36}$/i.test(s);

/** Who did what to which record, when and from which device; filter, page and export. */
export function AuditPanel() {
  const [filters, setFilters] = useState<AuditFilters>({});
  const [model, setModel] = useState<GridPaginationModel>({ page: 0, pageSize: 50 });
  const [exportError, setExportError] = useState<unknown>(null);
  const [viewing, setViewing] = useState<AuditEntry | null>(null);
  const fmt = useDisplayFormat();
  const siteList = useSites().data?.items;
  const columns = useMemo(
    () => columnsFor(fmt, (ids) => siteNames(ids, siteList), setViewing),
    [fmt, siteList],
  );
  // An unfinished record id is not sent: the API would answer 400.
  const sent = isUuid(filters.resuscitationId)
    ? filters
    : { ...filters, resuscitationId: undefined };
  const audit = useAudit(sent, { limit: model.pageSize, offset: model.page * model.pageSize });
  const onFilters = (f: AuditFilters) => {
    setFilters(f);
    setModel((m) => ({ ...m, page: 0 }));
  };
  return (
    <Stack spacing={2}>
      <AuditFilterBar value={filters} onChange={onFilters} />
      <Stack direction="row" sx={{ justifyContent: 'flex-end' }}>
        <Button
          startIcon={<Download />}
          variant="outlined"
          onClick={() => exportAudit(sent).catch(setExportError)}
        >
          Export CSV
        </Button>
      </Stack>
      {exportError !== null && <Alert severity="error">{apiErrorText(exportError)}</Alert>}
      {audit.isError ? (
        <ErrorState error={audit.error} onRetry={() => void audit.refetch()} />
      ) : (
        <DataGrid
          aria-label="Audit log"
          rows={audit.data?.items ?? []}
          rowCount={audit.data?.total ?? 0}
          columns={columns}
          loading={audit.isFetching}
          paginationMode="server"
          paginationModel={model}
          onPaginationModelChange={setModel}
          pageSizeOptions={[25, 50, 100]}
          disableRowSelectionOnClick
          onRowClick={({ row }) => setViewing(row)}
          autoHeight
          localeText={{ noRowsLabel: 'No audit entries match these filters' }}
        />
      )}
      {viewing && (
        <AuditEntryDialog
          entry={viewing}
          sites={(ids) => siteNames(ids, siteList)}
          onClose={() => setViewing(null)}
        />
      )}
    </Stack>
  );
}
