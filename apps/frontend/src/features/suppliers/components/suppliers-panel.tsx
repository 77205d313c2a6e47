import AddBusinessOutlined from '@mui/icons-material/AddBusinessOutlined';
import { Button, MenuItem, Paper, TextField } from '@mui/material';
import { useEffect, useState } from 'react';
import { FilterBar, FilterBarSpacer, allOptionProps } from '@/components/data-table/filter-bar';
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
  const [search, setSearch] = useState(list.filters.q);
  const { setFilter } = list;
  const urlQ = list.filters.q;

  // Type freely; the request waits until typing pauses.
  useEffect(() => {
    if (search === urlQ) return;
    const timer = setTimeout(() => setFilter('q', search.trim()), 300);
    return () => clearTimeout(timer);
  }, [search, urlQ, setFilter]);

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <TextField
          label="Search name or code"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
          fullWidth={false}
          sx={{ width: 320 }}
        />
        <TextField
          select
          label="Status"
          {...allOptionProps}
          value={list.filters.status}
          onChange={(event) => list.setFilter('status', event.target.value)}
          sx={{ width: 200 }}
        >
          <MenuItem value="">All</MenuItem>
          {SUPPLIER_STATUSES.map((status) => (
            <MenuItem key={status} value={status}>
              {supplierStatusLabels[status]}
            </MenuItem>
          ))}
        </TextField>
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
