import { Link } from '@mui/material';
import { Link as RouterLink, useNavigate } from 'react-router';
import {
  createDataTableColumnHelper,
  DataTable,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { paths } from '@/config/paths';
import { ReturnStatusChip } from '@/features/returns/components/return-status-chip';
import { formatMoney } from '@/features/returns/lib/chargeback';
import type { VendorReturn } from '@/features/returns/types';
import { formatDate } from '@/lib/dates';

const helper = createDataTableColumnHelper<VendorReturn>();

// Sortable ids are the server's sort fields: createdAt, number, status, chargebackTotal.
const columns = helper.columns([
  helper.accessor('number', {
    header: 'Return',
    enableSorting: true,
    cell: (info) => (
      <Link
        component={RouterLink}
        to={paths.returnDetail.getHref(info.row.original.id)}
        onClick={(e) => e.stopPropagation()}
        sx={{ whiteSpace: 'nowrap' }}
      >
        {info.getValue()}
      </Link>
    ),
  }),
  helper.accessor('createdAt', {
    header: 'Raised',
    enableSorting: true,
    cell: (info) => formatDate(info.getValue()),
  }),
  helper.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: (info) => <ReturnStatusChip status={info.getValue()} />,
  }),
  helper.accessor((r) => `${r.supplier.name} (${r.supplier.code})`, {
    id: 'supplier',
    header: 'Supplier',
  }),
  helper.accessor((r) => r.lots.map((l) => `${l.id} (PO ${l.poNumber})`).join(', '), {
    id: 'lots',
    header: 'Lots',
  }),
  helper.accessor((r) => r.rmaNumber ?? '—', { id: 'rma', header: 'RMA' }),
  helper.accessor('chargebackTotal', {
    header: 'Chargeback',
    enableSorting: true,
    cell: (info) => formatMoney(info.getValue(), info.row.original.currency),
  }),
]);

type ReturnsTableProps = Omit<
  DataTableProps<VendorReturn>,
  'columns' | 'label' | 'getRowId' | 'onRowClick'
>;

export function ReturnsTable(props: ReturnsTableProps) {
  const navigate = useNavigate();
  return (
    <DataTable
      label="Returns"
      columns={columns}
      getRowId={(r) => String(r.id)}
      onRowClick={(r) => void navigate(paths.returnDetail.getHref(r.id))}
      {...props}
    />
  );
}
