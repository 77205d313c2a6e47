import { useMemo } from 'react';
import {
  DataTable,
  createDataTableColumnHelper,
  editColumns,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { SupplierStatusChip } from '@/features/suppliers/components/supplier-status-chip';
import type { Supplier } from '@/features/suppliers/types';
import { formatDate } from '@/lib/dates';

const helper = createDataTableColumnHelper<Supplier>();

type SuppliersTableProps = Omit<DataTableProps<Supplier>, 'columns' | 'label' | 'getRowId'> & {
  /** Present only for roles that may edit. */
  onEdit?: (supplier: Supplier) => void;
};

export function SuppliersTable({ onEdit, ...props }: SuppliersTableProps) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('name', { header: 'Name', enableSorting: true }),
        helper.accessor('code', { header: 'Code', enableSorting: true }),
        helper.accessor('status', {
          header: 'Status',
          enableSorting: true,
          cell: (info) => <SupplierStatusChip status={info.getValue()} />,
        }),
        helper.accessor('contactEmail', {
          header: 'Contact',
          cell: (info) => info.getValue() ?? '—',
        }),
        helper.accessor('updatedAt', {
          header: 'Updated',
          cell: (info) => formatDate(info.getValue()),
        }),
        ...editColumns(onEdit),
      ]),
    [onEdit],
  );
  return (
    <DataTable
      {...props}
      label="Suppliers"
      columns={columns}
      getRowId={(supplier) => String(supplier.id)}
    />
  );
}
