import { Autocomplete, TextField } from '@mui/material';
import { useState } from 'react';
import { useProductOptions } from '@/features/lots/api/get-product-options';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { ProductOption } from '@/features/lots/types';

interface ProductAutocompleteProps {
  supplierId: number | null;
  value: ProductOption | null;
  onChange: (product: ProductOption | null) => void;
  error?: string;
}

const productLabel = (p: ProductOption) => `${p.sku} — ${p.description}`;

export function ProductAutocomplete({
  supplierId,
  value,
  onChange,
  error,
}: ProductAutocompleteProps) {
  const [input, setInput] = useState('');
  const search = useDebouncedValue(value && input === productLabel(value) ? '' : input);
  const products = useProductOptions(supplierId, search);
  const options = (products.data?.items ?? []).filter((p) => p.active);
  const loadError = products.isError ? 'The product list cannot be loaded. Try again.' : undefined;

  return (
    <Autocomplete
      value={value}
      onChange={(_event, next) => onChange(next)}
      inputValue={input}
      onInputChange={(_event, next) => setInput(next)}
      options={options}
      disabled={supplierId === null}
      loading={products.isFetching}
      filterOptions={(list) => list}
      getOptionLabel={productLabel}
      isOptionEqualToValue={(a, b) => a.id === b.id}
      noOptionsText={
        search ? 'No product of this supplier matches.' : 'This supplier has no active products.'
      }
      renderInput={(params) => (
        <TextField
          {...params}
          label="Product"
          required
          error={!!error || !!loadError}
          helperText={
            error ??
            loadError ??
            (supplierId === null ? 'Choose the supplier first.' : 'SKU or description.')
          }
        />
      )}
    />
  );
}
