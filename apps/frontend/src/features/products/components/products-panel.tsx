import AddOutlined from '@mui/icons-material/AddOutlined';
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
import { useProducts } from '@/features/products/api/get-products';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { ProductDialog } from '@/features/products/components/product-dialog';
import { ProductsTable } from '@/features/products/components/products-table';
import { PRODUCT_KINDS, kindLabels, type Product } from '@/features/products/types';

export function ProductsPanel({
  canWrite,
  canSetCriteria,
}: {
  canWrite: boolean;
  /** May set acceptance criteria (QA lead, admin); the server decides. */
  canSetCriteria: boolean;
}) {
  const list = useListParams({
    filters: ['q', 'supplierId', 'kind'],
    defaultSort: { field: 'sku', direction: 'asc' },
  });
  const products = useProducts(list.query);
  const [editing, setEditing] = useState<Product | 'new' | null>(null);

  const filtered = Boolean(list.filters.q || list.filters.supplierId || list.filters.kind);
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <FilterBar>
        <SearchFilter
          label="Search SKU or description"
          value={list.filters.q}
          setFilter={list.setFilter}
          width={300}
        />
        <SupplierSelect
          allowAll
          value={list.filters.supplierId ? Number(list.filters.supplierId) : null}
          onChange={(id) => list.setFilter('supplierId', id ? String(id) : '')}
        />
        <FilterSelect
          label="Kind"
          value={list.filters.kind}
          onChange={(kind) => list.setFilter('kind', kind)}
          options={optionsOf(PRODUCT_KINDS, kindLabels)}
          width={160}
        />
        <FilterBarSpacer />
        {canWrite && (
          <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setEditing('new')}>
            New product
          </Button>
        )}
      </FilterBar>
      <ProductsTable
        {...list.tableProps}
        data={products.data}
        loading={products.isFetching}
        error={products.error}
        onRetry={() => void products.refetch()}
        emptyMessage={filtered ? 'No product matches these filters.' : 'No products yet.'}
        onEdit={canWrite ? setEditing : undefined}
      />
      {editing && (
        <ProductDialog
          product={editing === 'new' ? null : editing}
          canSetCriteria={canSetCriteria}
          onClose={() => setEditing(null)}
        />
      )}
    </Paper>
  );
}
