import { Box, Chip, MenuItem, Stack, TextField } from '@mui/material';
import { useEffect, useState } from 'react';
import { useProductOptions } from '@/features/lots/api/get-product-options';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';
import { lotStatusLabels } from '@/features/lots/lib/lot-status';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { LOT_STATUSES, type LotStatus } from '@/features/lots/types';

export const LOT_FILTERS = [
  'status',
  'supplierId',
  'productId',
  'receivedFrom',
  'receivedTo',
  'q',
] as const;
export type LotFilterName = (typeof LOT_FILTERS)[number];

interface LotsFiltersProps {
  filters: Record<LotFilterName, string>;
  setFilter: (name: LotFilterName, value: string) => void;
  setFilters: (changes: Partial<Record<LotFilterName, string>>) => void;
}

export const parseStatuses = (text: string): LotStatus[] =>
  text.split(',').filter((s): s is LotStatus => (LOT_STATUSES as readonly string[]).includes(s));

export function LotsFilters({ filters, setFilter, setFilters }: LotsFiltersProps) {
  const statuses = parseStatuses(filters.status);
  const supplierId = filters.supplierId ? Number(filters.supplierId) : null;
  const products = useProductOptions(supplierId, '');
  const [text, setText] = useState(filters.q);
  const debounced = useDebouncedValue(text, 400);
  useEffect(() => {
    if (debounced !== filters.q) setFilter('q', debounced.trim());
  }, [debounced, filters.q, setFilter]);

  const toggle = (status: LotStatus) => {
    const next = statuses.includes(status)
      ? statuses.filter((s) => s !== status)
      : [...statuses, status];
    setFilter('status', next.join(','));
  };

  return (
    <Stack spacing={2}>
      <Stack
        direction="row"
        spacing={1}
        useFlexGap
        sx={{ flexWrap: 'wrap' }}
        role="group"
        aria-label="Status"
      >
        {LOT_STATUSES.map((status) => (
          <Chip
            key={status}
            label={lotStatusLabels[status]}
            color={statuses.includes(status) ? 'primary' : 'default'}
            variant={statuses.includes(status) ? 'filled' : 'outlined'}
            onClick={() => toggle(status)}
            aria-pressed={statuses.includes(status)}
          />
        ))}
      </Stack>
      <Stack
        direction={{ xs: 'column', md: 'row' }}
        spacing={2}
        useFlexGap
        // Search, supplier and product share the first line; the two dates wrap below them
        // together on a laptop screen and join the line on a wide one.
        sx={{ flexWrap: 'wrap', alignItems: { md: 'flex-start' } }}
      >
        <TextField
          label="Search"
          placeholder="PO, packing slip, lot code, SKU, supplier"
          value={text}
          onChange={(e) => setText(e.target.value)}
          sx={{ flex: { md: '2 1 260px' } }}
        />
        <Box sx={{ flex: { md: '2 1 300px' } }}>
          <SupplierSelect
            allowAll
            fullWidth
            value={supplierId}
            onChange={(id) => setFilters({ supplierId: id ? String(id) : '', productId: '' })}
          />
        </Box>
        <TextField
          select
          label="Product"
          value={filters.productId}
          disabled={supplierId === null}
          helperText={supplierId === null ? 'Choose a supplier first.' : undefined}
          onChange={(e) => setFilter('productId', e.target.value)}
          sx={{ flex: { md: '1 1 200px' } }}
        >
          <MenuItem value="">All products</MenuItem>
          {(products.data?.items ?? []).map((p) => (
            <MenuItem key={p.id} value={String(p.id)}>
              {p.sku}
            </MenuItem>
          ))}
        </TextField>
        <Stack direction="row" spacing={2} sx={{ flex: { md: '1 1 356px' } }}>
          <TextField
            type="date"
            label="Received from"
            value={filters.receivedFrom}
            onChange={(e) => setFilter('receivedFrom', e.target.value)}
            slotProps={{ inputLabel: { shrink: true } }}
            sx={{ flex: 1, minWidth: 150 }}
          />
          <TextField
            type="date"
            label="Received to"
            value={filters.receivedTo}
            onChange={(e) => setFilter('receivedTo', e.target.value)}
            slotProps={{ inputLabel: { shrink: true } }}
            sx={{ flex: 1, minWidth: 150 }}
          />
        </Stack>
      </Stack>
    </Stack>
  );
}
