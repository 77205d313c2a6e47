import { Link, Typography } from '@mui/material';
import { Link as RouterLink, useNavigate } from 'react-router';
import {
  createDataTableColumnHelper,
  DataTable,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { paths } from '@/config/paths';
import { CarStatusChip } from '@/features/corrective-actions/components/car-status-chip';
import type { CorrectiveAction } from '@/features/corrective-actions/types';

const helper = createDataTableColumnHelper<CorrectiveAction>();

// Sortable ids are the server's sort fields: number, dueOn, status (and createdAt).
const columns = helper.columns([
  helper.accessor('number', {
    header: 'SCAR',
    enableSorting: true,
    cell: (info) => (
      <Link
        component={RouterLink}
        to={paths.correctiveActionDetail.getHref(info.row.original.id)}
        onClick={(e) => e.stopPropagation()}
        sx={{ whiteSpace: 'nowrap' }}
      >
        {info.getValue()}
      </Link>
    ),
  }),
  helper.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: (info) => <CarStatusChip car={info.row.original} />,
  }),
  helper.accessor((c) => `${c.supplier.name} (${c.supplier.code})`, {
    id: 'supplier',
    header: 'Supplier',
  }),
  helper.accessor('problem', {
    header: 'Problem',
    cell: (info) => (
      <Typography variant="body2" noWrap sx={{ maxWidth: 320 }} title={info.getValue()}>
        {info.getValue()}
      </Typography>
    ),
  }),
  helper.accessor((c) => c.lots.map((l) => l.id).join(', '), { id: 'lots', header: 'Lots' }),
  helper.accessor('dueOn', {
    header: 'Due',
    enableSorting: true,
    cell: (info) => (
      <Typography
        variant="body2"
        color={info.row.original.overdue ? 'error' : undefined}
        sx={{ whiteSpace: 'nowrap', fontWeight: info.row.original.overdue ? 600 : undefined }}
      >
        {info.getValue()}
      </Typography>
    ),
  }),
]);

type CorrectiveActionsTableProps = Omit<
  DataTableProps<CorrectiveAction>,
  'columns' | 'label' | 'getRowId' | 'onRowClick'
>;

export function CorrectiveActionsTable(props: CorrectiveActionsTableProps) {
  const navigate = useNavigate();
  return (
    <DataTable
      label="Corrective actions"
      columns={columns}
      getRowId={(c) => String(c.id)}
      onRowClick={(c) => void navigate(paths.correctiveActionDetail.getHref(c.id))}
      {...props}
    />
  );
}
