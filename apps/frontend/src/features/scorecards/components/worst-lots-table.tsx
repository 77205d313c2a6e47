import {
  Link,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { formatPercent, NONE } from '@/features/scorecards/lib/format';
import type { WorstLot } from '@/features/scorecards/types';
import { isoDayOf } from '@/lib/dates';

/** The lots with the lowest measured area, lowest first, each linking to its lot page. */
export function WorstLotsTable({ lots }: { lots: WorstLot[] }) {
  if (lots.length === 0) {
    return (
      <Typography color="text.secondary" sx={{ py: 2 }}>
        No lot of this supplier has a reading in this range.
      </Typography>
    );
  }
  return (
    <TableContainer>
      <Table size="small" aria-label="Worst lots" sx={{ '& td, & th': { whiteSpace: 'nowrap' } }}>
        <TableHead>
          <TableRow>
            <TableCell>Lot</TableCell>
            <TableCell>PO</TableCell>
            <TableCell>Received</TableCell>
            <TableCell>SKU</TableCell>
            <TableCell>Label</TableCell>
            <TableCell>Measures as</TableCell>
            <TableCell align="right">Lowest area</TableCell>
            <TableCell align="right">Sizes short (worst conductor)</TableCell>
            <TableCell>Status</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {lots.map((lot) => (
            <TableRow key={lot.lotId}>
              <TableCell>
                <Link component={RouterLink} to={paths.lot.getHref(lot.lotId)}>
                  Lot {lot.lotId}
                </Link>
              </TableCell>
              <TableCell>{lot.poNumber}</TableCell>
              <TableCell>{isoDayOf(lot.receivedAt)}</TableCell>
              <TableCell>{lot.sku}</TableCell>
              <TableCell>{lot.label ?? NONE}</TableCell>
              <TableCell>{lot.measuresAs ?? NONE}</TableCell>
              <TableCell align="right">{formatPercent(lot.lowestAreaRatio)}</TableCell>
              <TableCell align="right">
                {lot.sizesShort === null ? NONE : Math.max(0, lot.sizesShort)}
              </TableCell>
              <TableCell>{lot.status.replaceAll('_', ' ')}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
