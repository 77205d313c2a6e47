import { Autocomplete, TextField } from '@mui/material';
import { renderSupplierOption } from '@/components/supplier-select/supplier-select';
import { useState } from 'react';
import { useSupplierOptions } from '@/features/lots/api/get-supplier-options';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import type { SupplierOption } from '@/features/lots/types';

interface SupplierAutocompleteProps {
  value: SupplierOption | null;
  onChange: (supplier: SupplierOption | null) => void;
  error?: string;
  label?: string;
}

export function SupplierAutocomplete({
  value,
  onChange,
  error,
  label = 'Supplier',
}: SupplierAutocompleteProps) {
  const [input, setInput] = useState('');
  const search = useDebouncedValue(value && input === `${value.name} (${value.code})` ? '' : input);
  const suppliers = useSupplierOptions(search);
  const loadError = suppliers.isError
    ? 'The supplier list cannot be loaded. Try again.'
    : undefined;

  return (
    <Autocomplete
      value={value}
      onChange={(_event, next) => onChange(next)}
      inputValue={input}
      onInputChange={(_event, next) => setInput(next)}
      options={suppliers.data?.items ?? []}
      loading={suppliers.isFetching}
      filterOptions={(options) => options}
      getOptionLabel={(s) => `${s.name} (${s.code})`}
      isOptionEqualToValue={(a, b) => a.id === b.id}
      noOptionsText={search ? 'No supplier matches.' : 'No suppliers yet.'}
      renderOption={(props, s) => renderSupplierOption(props, s)}
      renderInput={(params) => (
        <TextField
          {...params}
          label={label}
          required
          error={!!error || !!loadError}
          helperText={error ?? loadError ?? 'Type part of the name or code.'}
        />
      )}
    />
  );
}
