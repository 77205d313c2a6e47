import { Box } from '@mui/material';
import type { ReactNode } from 'react';

/**
 * A row of form fields on a grid (one column on phones). A grid, not a Stack: Stack clears
 * its children's margins, which clips the outlined labels.
 */
export function FormRow({ columns, children }: { columns: string; children: ReactNode }) {
  return (
    <Box
      sx={{
        display: 'grid',
        gridTemplateColumns: { xs: '1fr', md: columns },
        columnGap: 1.5,
        alignItems: 'start',
      }}
    >
      {children}
    </Box>
  );
}
