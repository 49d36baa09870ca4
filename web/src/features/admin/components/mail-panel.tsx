import { Alert, Button, Chip, Stack, Typography } from '@mui/material';
import { DataGrid, type GridColDef, type GridPaginationModel } from '@mui/x-data-grid';
import { labelOf, mailStatusLabels, type MailSinkMessage } from '@upstroke/contracts';
import { useState } from 'react';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { ErrorState } from '../../../components/ui/states';
import { useMail } from '../api/list-mail';
import { MailMessageDialog } from './mail-message-dialog';

/** Mail: the delivery queue's state, and what the local sink received (development). */
export function MailPanel() {
  const [model, setModel] = useState<GridPaginationModel>({ page: 0, pageSize: 25 });
  const [open, setOpen] = useState<number | null>(null);
  const { dateTime } = useDisplayFormat();
  const mail = useMail({ limit: model.pageSize, offset: model.page * model.pageSize });
  const columns: GridColDef<MailSinkMessage>[] = [
    {
      field: 'receivedAt',
      headerName: 'Received',
      width: 190,
      valueFormatter: (v: string) => dateTime(v),
    },
    {
      field: 'to',
      headerName: 'To',
      flex: 1,
      minWidth: 200,
      valueGetter: (_v, r) => r.to.join(', '),
    },
    { field: 'subject', headerName: 'Subject', flex: 1, minWidth: 200 },
    {
      field: 'open',
      headerName: '',
      width: 110,
      sortable: false,
      renderCell: ({ row }) => (
        <Button
          onClick={() => setOpen(row.id)}
          aria-label={`Open message to ${row.to.join(', ')}: ${row.subject ?? ''}`}
        >
          Open
        </Button>
      ),
    },
  ];
  if (mail.isError) return <ErrorState error={mail.error} onRetry={() => void mail.refetch()} />;
  const outbox = mail.data?.outbox;
  return (
    <Stack spacing={2}>
      <Stack
        direction="row"
        spacing={1}
        sx={{ alignItems: 'center', flexWrap: 'wrap' }}
        aria-label="Delivery queue"
      >
        <Typography variant="h3" component="h2">
          Delivery queue
        </Typography>
        {outbox === null && (
          <Typography color="text.secondary">No queue on this server.</Typography>
        )}
        {outbox && Object.keys(outbox).length === 0 && (
          <Typography color="text.secondary">Empty.</Typography>
        )}
        {outbox &&
          Object.entries(outbox).map(([status, n]) => (
            <Chip
              key={status}
              label={`${labelOf(mailStatusLabels, status)}: ${n}`}
              color={status === 'failed' ? 'error' : 'default'}
            />
          ))}
        <Button onClick={() => void mail.refetch()}>Refresh</Button>
      </Stack>
      <Alert severity="info">
        The local mail sink keeps every message this server sends in development; nothing leaves the
        machine.
      </Alert>
      <DataGrid
        aria-label="Sink messages"
        rows={mail.data?.sink.items ?? []}
        rowCount={mail.data?.sink.total ?? 0}
        columns={columns}
        loading={mail.isFetching}
        paginationMode="server"
        paginationModel={model}
        onPaginationModelChange={setModel}
        pageSizeOptions={[25, 50]}
        disableRowSelectionOnClick
        autoHeight
        localeText={{ noRowsLabel: 'No messages received yet' }}
      />
      {open !== null && <MailMessageDialog id={open} onClose={() => setOpen(null)} />}
    </Stack>
  );
}
