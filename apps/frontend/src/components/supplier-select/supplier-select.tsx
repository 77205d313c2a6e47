import { Autocomplete, Chip, TextField } from '@mui/material';
import { useState, type HTMLAttributes, type Key } from 'react';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import {
  useSupplierChoice,
  useSupplierSearch,
  type SupplierChoice,
} from '@/components/supplier-select/get-suppliers';

interface SupplierSelectProps {
  label?: string;
  value: number | null;
  onChange: (supplierId: number | null) => void;
  /** A filter: empty means all suppliers, rather than a choice the form requires. */
  allowAll?: boolean;
  error?: string;
  required?: boolean;
  disabled?: boolean;
  /** Fill the width it is given; by default only a form field (not allowAll) does. */
  fullWidth?: boolean;
}

const text = (s: Pick<SupplierChoice, 'name' | 'code'>) => `${s.name} (${s.code})`;

/** A supplier in a picker's list: name, code, and its standing when not approved. */
export function renderSupplierOption(
  { key, ...props }: HTMLAttributes<HTMLLIElement> & { key: Key },
  s: Pick<SupplierChoice, 'name' | 'code' | 'status'>,
) {
  return (
    <li key={key} {...props}>
      {text(s)}
      {s.status !== 'approved' && (
        <Chip
          size="small"
          sx={{ ml: 1 }}
          color={s.status === 'suspended' ? 'error' : 'warning'}
          label={s.status === 'suspended' ? 'Suspended' : 'Probation'}
        />
      )}
    </li>
  );
}

/**
 * A supplier chosen by typing part of its name or code, searched on the server, so a
 * distributor with hundreds of suppliers finds every one (a plain list stopped at 100).
 */
export function SupplierSelect({
  label = 'Supplier',
  value,
  onChange,
  allowAll,
  error,
  required,
  disabled,
  fullWidth = !allowAll,
}: SupplierSelectProps) {
  const [input, setInput] = useState('');
  const chosen = useSupplierChoice(value);
  const selected = value !== null && chosen.data?.id === value ? chosen.data : null;
  const search = useDebouncedValue(selected && input === text(selected) ? '' : input);
  const suppliers = useSupplierSearch(search);
  const found = suppliers.data?.items ?? [];
  const options =
    selected && !found.some((s) => s.id === selected.id) ? [selected, ...found] : found;
  const loadError =
    suppliers.isError || chosen.isError
      ? 'The supplier list cannot be loaded. Try again.'
      : undefined;
  return (
    <Autocomplete
      value={selected}
      onChange={(_event, next) => onChange(next?.id ?? null)}
      inputValue={input}
      onInputChange={(_event, next) => setInput(next)}
      options={options}
      loading={suppliers.isFetching}
      filterOptions={(all) => all}
      getOptionLabel={text}
      isOptionEqualToValue={(a, b) => a.id === b.id}
      noOptionsText={search ? 'No supplier matches.' : 'No suppliers yet.'}
      fullWidth={fullWidth}
      disabled={disabled}
      renderOption={(props, s) => renderSupplierOption(props, s)}
      renderInput={(params) => (
        <TextField
          {...params}
          label={label}
          required={required}
          placeholder={allowAll ? 'All suppliers' : undefined}
          sx={{ minWidth: 300 }}
          error={!!error || !!loadError}
          helperText={
            error ?? loadError ?? (allowAll ? undefined : 'Type part of the name or code.')
          }
        />
      )}
    />
  );
}
