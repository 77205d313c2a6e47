import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import { Box, Stack, Tooltip, Typography } from '@mui/material';
import { useMemo } from 'react';
import {
  DataTable,
  createDataTableColumnHelper,
  editColumns,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { InspectionStateChip } from '@/features/products/components/inspection-state-chip';
import { kindLabels, purposeLabels, type Product } from '@/features/products/types';

const helper = createDataTableColumnHelper<Product>();

type ProductsTableProps = Omit<DataTableProps<Product>, 'columns' | 'label' | 'getRowId'> & {
  onEdit?: (product: Product) => void;
};

export function ProductsTable({ onEdit, ...props }: ProductsTableProps) {
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor('sku', {
          header: 'SKU',
          enableSorting: true,
          cell: (info) => (
            <Box component="span" sx={{ whiteSpace: 'nowrap' }}>
              {info.getValue()}
            </Box>
          ),
        }),
        helper.accessor('description', { header: 'Description', enableSorting: true }),
        helper.accessor((p) => p.supplier.name, {
          id: 'supplier',
          header: 'Supplier',
          enableSorting: true,
        }),
        helper.accessor('kind', {
          header: 'Kind',
          enableSorting: true,
          cell: (info) => kindLabels[info.getValue()],
        }),
        helper.display({
          id: 'conductors',
          header: 'Conductors',
          cell: ({ row }) => (
            <Stack spacing={0}>
              {row.original.conductors.map((c) => (
                <Typography key={c.id} variant="body2">
                  {purposeLabels[c.purpose]}: {c.gauge}
                </Typography>
              ))}
            </Stack>
          ),
        }),
        helper.display({
          id: 'inspection',
          header: 'Inspection',
          cell: ({ row }) => (
            <Stack direction="row" spacing={0.5} sx={{ alignItems: 'center' }}>
              <InspectionStateChip state={row.original.inspectionState} />
              {row.original.warnings.length > 0 && (
                <Tooltip title={row.original.warnings.join(' ')}>
                  <WarningAmberOutlined
                    color="warning"
                    fontSize="small"
                    aria-label={row.original.warnings.join(' ')}
                  />
                </Tooltip>
              )}
            </Stack>
          ),
        }),
        ...editColumns(onEdit),
      ]),
    [onEdit],
  );
  return (
    <DataTable
      {...props}
      label="Products"
      columns={columns}
      getRowId={(product) => String(product.id)}
    />
  );
}
