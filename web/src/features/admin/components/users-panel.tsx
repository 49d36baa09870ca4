import PersonAdd from '@mui/icons-material/PersonAdd';
import { Alert, Button, Chip, Stack } from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { type AdminUser, roleLabels } from '@upstroke/contracts';
import { useState } from 'react';
import { EmptyState, ErrorState } from '../../../components/ui/states';
import { useUsers } from '../api/list-users';
import { useSites } from '../api/list-sites';
import { siteNames } from './site-names';
import { UserDialog } from './user-dialog';

/** Everyone who can sign in, with their role, sites and state. */
export function UsersPanel() {
  const users = useUsers();
  const sites = useSites();
  const [editing, setEditing] = useState<AdminUser | 'new' | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const columns: GridColDef<AdminUser>[] = [
    { field: 'name', headerName: 'Name', flex: 1, minWidth: 160 },
    { field: 'email', headerName: 'E-mail', flex: 1, minWidth: 200 },
    {
      field: 'role',
      headerName: 'Role',
      width: 160,
      valueGetter: (_v, row) => roleLabels[row.role],
    },
    {
      field: 'siteIds',
      headerName: 'Sites',
      flex: 1,
      minWidth: 160,
      valueGetter: (_v, row) => siteNames(row.siteIds, sites.data?.items),
    },
    {
      field: 'active',
      headerName: 'State',
      width: 170,
      renderCell: ({ row }) => (
        <Chip
          size="small"
          color={!row.active ? 'default' : row.passwordSet ? 'success' : 'warning'}
          label={!row.active ? 'Deactivated' : row.passwordSet ? 'Active' : 'Invitation sent'}
        />
      ),
    },
    {
      field: 'actions',
      headerName: '',
      width: 110,
      sortable: false,
      renderCell: ({ row }) => (
        <Button onClick={() => setEditing(row)} aria-label={`Edit ${row.name}`}>
          Edit
        </Button>
      ),
    },
  ];
  if (users.isError) return <ErrorState error={users.error} onRetry={() => void users.refetch()} />;
  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ justifyContent: 'flex-end' }}>
        <Button variant="contained" startIcon={<PersonAdd />} onClick={() => setEditing('new')}>
          Invite user
        </Button>
      </Stack>
      {notice && (
        <Alert severity="success" onClose={() => setNotice(null)}>
          {notice}
        </Alert>
      )}
      {users.data?.total === 0 ? (
        <EmptyState title="No users yet">Invite the first person with Invite user.</EmptyState>
      ) : (
        <DataGrid
          aria-label="Users"
          rows={users.data?.items ?? []}
          columns={columns}
          loading={users.isPending}
          rowHeight={52}
          disableRowSelectionOnClick
          autoHeight
          pageSizeOptions={[25, 50, 100]}
          initialState={{ pagination: { paginationModel: { pageSize: 25 } } }}
        />
      )}
      {editing && (
        <UserDialog
          user={editing === 'new' ? null : editing}
          sites={sites.data?.items ?? []}
          onClose={() => setEditing(null)}
          onDone={(message) => {
            setNotice(message);
            setEditing(null);
          }}
        />
      )}
    </Stack>
  );
}
