import { Link } from '@mui/material';
import { DataGrid, type GridColDef, type GridSortModel } from '@mui/x-data-grid';
import {
  formatEtco2Both,
  formatPercent,
  labelOf,
  outcomeLabels,
  reviewStatusLabels,
  rhythmLabels,
  type TrendsFilter,
  type TrendsRecord,
} from '@upstroke/contracts';
import { useMemo, useState } from 'react';
import { type Formatter, useDisplayFormat } from '../../../hooks/use-display-format';
import { Link as RouterLink } from 'react-router-dom';
import { type RecordsPaging, useTrendRecords } from '../api/get-trend-records';
import { ErrorState } from '../../../components/ui/states';

const pct = (v: unknown) => formatPercent(typeof v === 'number' ? v : null);
const sec = (v: unknown) => (typeof v === 'number' ? `${Math.round(v)} s` : '—');

const columnsFor = (f: Formatter): GridColDef<TrendsRecord>[] => [
  {
    field: 'arrestAt',
    headerName: 'Arrest',
    width: 140,
    renderCell: ({ row }) => (
      <Link component={RouterLink} to={`/debrief/${row.resuscitationId}`}>
        {f.dateTime(row.arrestAt)}
      </Link>
    ),
  },
  { field: 'unitName', headerName: 'Unit', width: 110, sortable: false },
  {
    field: 'firstRhythm',
    headerName: 'First rhythm',
    width: 110,
    sortable: false,
    valueFormatter: (v: string | null) => labelOf(rhythmLabels, v),
  },
  {
    field: 'outcome',
    headerName: 'Outcome',
    width: 130,
    sortable: false,
    valueFormatter: (v: string | null) => labelOf(outcomeLabels, v),
  },
  {
    field: 'compressionFraction',
    headerName: 'Compr. fraction',
    description: 'Compression fraction',
    width: 110,
    valueFormatter: pct,
  },
  {
    field: 'fractionGe10',
    headerName: `EtCO2 ≥ ${formatEtco2Both(10)}`,
    description: `Share of CPR time with EtCO2 at or above ${formatEtco2Both(10)}`,
    width: 160,
    valueFormatter: pct,
  },
  { field: 'timeToFirstShockSec', headerName: 'First shock', width: 95, valueFormatter: sec },
  {
    field: 'timeToFirstEpinephrineSec',
    headerName: 'First epi.',
    description: 'Time to first epinephrine',
    width: 95,
    valueFormatter: sec,
  },
  {
    field: 'preshockLongCount',
    headerName: 'Long pre-shock',
    description: 'Long pre-shock pauses',
    width: 105,
  },
  {
    field: 'reviewStatus',
    headerName: 'Review',
    flex: 1,
    minWidth: 120,
    sortable: false,
    valueFormatter: (v: string | null) => labelOf(reviewStatusLabels, v ?? 'awaiting'),
  },
];

/** The filtered records, sorted and paged by the server; each opens its Debrief. */
export function RecordsGrid({ filter }: { filter: TrendsFilter }) {
  const [paging, setPaging] = useState<RecordsPaging>({
    sort: 'arrestAt',
    order: 'desc',
    limit: 25,
    offset: 0,
  });
  const { data, isFetching, error, refetch } = useTrendRecords(filter, paging);
  const fmt = useDisplayFormat(filter.siteId);
  const columns = useMemo(() => columnsFor(fmt), [fmt]);
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const onSort = (model: GridSortModel) => {
    const first = model[0];
    setPaging((p) => ({
      ...p,
      offset: 0,
      sort: (first?.field ?? 'arrestAt') as RecordsPaging['sort'],
      order: first?.sort ?? 'desc',
    }));
  };
  return (
    <DataGrid
      aria-label="Records"
      rows={data?.items ?? []}
      getRowId={(r) => r.resuscitationId}
      columns={columns}
      loading={isFetching}
      rowCount={data?.total ?? 0}
      paginationMode="server"
      sortingMode="server"
      disableColumnFilter
      pageSizeOptions={[25, 50, 100]}
      paginationModel={{ page: paging.offset / paging.limit, pageSize: paging.limit }}
      onPaginationModelChange={(m) =>
        setPaging((p) => ({ ...p, limit: m.pageSize, offset: m.page * m.pageSize }))
      }
      sortModel={[{ field: paging.sort, sort: paging.order }]}
      onSortModelChange={onSort}
      autoHeight
      disableRowSelectionOnClick
      // The toolbar's column chooser; its own CSV and print are left out (the page's CSV is
      // the audited, rounded one).
      showToolbar
      slotProps={{
        toolbar: {
          csvOptions: { disableToolbarButton: true },
          printOptions: { disableToolbarButton: true },
        },
      }}
      localeText={{
        toolbarColumns: 'Columns',
        noRowsLabel: 'No signed records match these filters',
      }}
    />
  );
}
