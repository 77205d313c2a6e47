import {
  Button,
  Chip,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
} from '@mui/material';
import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { User } from '@/features/users/types';
import { roleLabels } from '@/lib/roles';
import { formatDate } from '@/lib/dates';

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, User>();

interface UsersTableProps {
  users: User[];
  currentUserId: number;
  busyUserId: number | null;
  onEdit: (user: User) => void;
  onToggleActive: (user: User) => void;
}

export function UsersTable({
  users,
  currentUserId,
  busyUserId,
  onEdit,
  onToggleActive,
}: UsersTableProps) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('name', { header: 'Name' }),
        helper.accessor('email', { header: 'E-mail' }),
        helper.accessor('role', { header: 'Role', cell: (info) => roleLabels[info.getValue()] }),
        helper.accessor('active', {
          header: 'Status',
          cell: (info) =>
            info.getValue() ? (
              <Chip size="small" color="success" variant="outlined" label="Active" />
            ) : (
              <Chip size="small" label="Inactive" />
            ),
        }),
        helper.accessor('createdAt', {
          header: 'Created',
          cell: (info) => formatDate(info.getValue()),
        }),
        helper.display({
          id: 'actions',
          header: 'Actions',
          cell: ({ row }) => {
            const user = row.original;
            const self = user.id === currentUserId;
            return (
              <Stack direction="row" spacing={1}>
                <Button size="small" onClick={() => onEdit(user)}>
                  Edit
                </Button>
                <Button
                  size="small"
                  color={user.active ? 'error' : 'primary'}
                  disabled={self || busyUserId === user.id}
                  title={self ? 'You cannot deactivate your own account.' : undefined}
                  onClick={() => onToggleActive(user)}
                >
                  {user.active ? 'Deactivate' : 'Activate'}
                </Button>
              </Stack>
            );
          },
        }),
      ]),
    [currentUserId, busyUserId, onEdit, onToggleActive],
  );

  const table = useTable({ features, columns, data: users, getRowId: (user) => String(user.id) });

  return (
    <TableContainer>
      <Table size="small" aria-label="Users">
        <TableHead>
          {table.getHeaderGroups().map((group) => (
            <TableRow key={group.id}>
              {group.headers.map((header) => (
                <TableCell key={header.id}>
                  {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableHead>
        <TableBody>
          {table.getRowModel().rows.map((row) => (
            <TableRow key={row.id} hover sx={row.original.active ? undefined : { opacity: 0.6 }}>
              {row.getAllCells().map((cell) => (
                <TableCell key={cell.id}>
                  <table.FlexRender cell={cell} />
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
