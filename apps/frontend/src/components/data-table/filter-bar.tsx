import { Box, MenuItem, TextField } from '@mui/material';
import { useEffect, useState, type ReactNode } from 'react';

/**
 * The row of filters and commands above a DataTable. Wraps on narrow screens; text fields
 * inside lose their form margins. Give fields `fullWidth={false}` and a width.
 */
export function FilterBar({ children }: { children: ReactNode }) {
  return (
    <Box
      sx={{
        display: 'flex',
        flexWrap: 'wrap',
        alignItems: 'center',
        gap: 2,
        mb: 1,
        '& .MuiTextField-root': { m: 0 },
      }}
    >
      {children}
    </Box>
  );
}

/** Pushes what follows it to the end of the FilterBar. */
export const FilterBarSpacer = () => <Box sx={{ flexGrow: 1 }} />;

/** Props for a select filter whose empty value means "all": show it, with its label up. */
export const allOptionProps = {
  fullWidth: false,
  slotProps: { select: { displayEmpty: true }, inputLabel: { shrink: true } },
} as const;

export interface FilterOption {
  value: string;
  label: string;
}

/** The options of an enum filter: each value with its label. */
export const optionsOf = <V extends string>(
  values: readonly V[],
  labels: Readonly<Record<V, string>>,
): FilterOption[] => values.map((value) => ({ value, label: labels[value] }));

/**
 * A choice among `options` above a list; the empty value means all of them. With `showAll`
 * (the default) the empty choice is shown by its words ("All") under a raised label,
 * otherwise the label stands in the empty field.
 */
export function FilterSelect({
  label,
  value,
  onChange,
  options,
  width,
  allLabel = 'All',
  showAll = true,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly FilterOption[];
  width: number;
  allLabel?: string;
  showAll?: boolean;
}) {
  return (
    <TextField
      select
      label={label}
      {...(showAll ? allOptionProps : { fullWidth: false })}
      value={value}
      onChange={(event) => onChange(event.target.value)}
      sx={{ width }}
    >
      <MenuItem value="">{allLabel}</MenuItem>
      {options.map((option) => (
        <MenuItem key={option.value} value={option.value}>
          {option.label}
        </MenuItem>
      ))}
    </TextField>
  );
}

/**
 * The search box above a list, for its `q` filter: type freely, the request waits until
 * typing pauses (300 ms), trimmed.
 */
export function SearchFilter({
  label,
  value,
  setFilter,
  width,
}: {
  label: string;
  /** `q` as the list has it (the address bar). */
  value: string;
  /** The list's setFilter (useListParams). */
  setFilter: (name: 'q', value: string) => void;
  width: number;
}) {
  const [search, setSearch] = useState(value);
  useEffect(() => {
    if (search === value) return;
    const timer = setTimeout(() => setFilter('q', search.trim()), 300);
    return () => clearTimeout(timer);
  }, [search, value, setFilter]);
  return (
    <TextField
      label={label}
      value={search}
      onChange={(event) => setSearch(event.target.value)}
      fullWidth={false}
      sx={{ width }}
    />
  );
}
