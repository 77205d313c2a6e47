import AddBusinessOutlined from '@mui/icons-material/AddBusinessOutlined';
import { Button, Paper } from '@mui/material';
import { useState } from 'react';
import {
  FilterBar,
  FilterBarSpacer,
  FilterSelect,
  SearchFilter,
  optionsOf,
} from '@/components/data-table/filter-bar';
import { useListParams } from '@/components/data-table/use-list-params';
import { useSuppliers } from '@/features/suppliers/api/get-suppliers';
import { SupplierDialog } from '@/features/suppliers/components/supplier-dialog';
import { SuppliersTable } from '@/features/suppliers/components/suppliers-table';
import { SUPPLIER_STATUSES, supplierStatusLabels, type Supplier } from '@/features/suppliers/types';

/** The supplier list with its filters; `canWrite` shows the create and edit commands. */
export function SuppliersPanel({ canWrite }: { canWrite: boolean }) {
  const list = useListParams({
    filters: ['q', 'status'],
    defaultSort: { field: 'name', direction: 'asc' },
  });
  const suppliers = useSuppliers(list.query);
  const [editing, setEditing] = useState<Supplier | 'new' | null>(null);

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <SearchFilter
          label="Search name or code"
          value={list.filters.q}
          setFilter={list.setFilter}
          width={320}
        />
        <FilterSelect
          label="Status"
          value={list.filters.status}
          onChange={(status) => list.setFilter('status', status)}
          options={optionsOf(SUPPLIER_STATUSES, supplierStatusLabels)}
          width={200}
        />
        <FilterBarSpacer />
        {canWrite && (
          <Button
            variant="contained"
            startIcon={<AddBusinessOutlined />}
            onClick={() => setEditing('new')}
          >
            New supplier
          </Button>
        )}
      </FilterBar>
      <SuppliersTable
        {...list.tableProps}
        data={suppliers.data}
        loading={suppliers.isFetching}
        error={suppliers.error}
        onRetry={() => void suppliers.refetch()}
        emptyMessage={
          list.filters.q || list.filters.status
            ? 'No supplier matches these filters.'
            : 'No suppliers yet.'
        }
        onEdit={canWrite ? setEditing : undefined}
      />
      {editing && (
        <SupplierDialog
          supplier={editing === 'new' ? null : editing}
          onClose={() => setEditing(null)}
        />
      )}
    </Paper>
  );
}
