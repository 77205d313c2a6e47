import { Box } from '@mui/material';
import type { ReactNode } from 'react';

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
