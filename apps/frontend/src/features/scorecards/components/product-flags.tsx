import {
  Alert,
  AlertTitle,
  Chip,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
} from '@mui/material';
import { formatPercent } from '@/features/scorecards/lib/format';
import type { ProductSeverity } from '@/features/scorecards/types';

const severityColor = {
  normal: 'default',
  reduced: 'success',
  tightened: 'warning',
  discontinued: 'error',
} as const;

/** Products on tightened inspection or discontinued, each with the reason, as alerts. */
export function ProductFlags({ products }: { products: ProductSeverity[] }) {
  const flagged = products.filter(
    (p) => p.severity === 'tightened' || p.severity === 'discontinued',
  );
  if (flagged.length === 0) return null;
  return (
    <Stack spacing={1}>
      {flagged.map((p) => (
        <Alert key={p.productId} severity={p.severity === 'discontinued' ? 'error' : 'warning'}>
          <AlertTitle>
            {p.sku}:{' '}
            {p.severity === 'discontinued' ? 'inspection discontinued' : 'on tightened inspection'}
          </AlertTitle>
          {p.reason ?? 'No reason was recorded.'}
        </Alert>
      ))}
    </Stack>
  );
}

/** Every product of the supplier with its ISO 2859-1 inspection severity today. */
export function ProductSeverityTable({ products }: { products: ProductSeverity[] }) {
  if (products.length === 0) {
    return <Typography color="text.secondary">This supplier has no product yet.</Typography>;
  }
  return (
    <Table size="small" aria-label="Inspection severity by product">
      <TableHead>
        <TableRow>
          <TableCell>Product</TableCell>
          <TableCell>Severity</TableCell>
          <TableCell sx={{ whiteSpace: 'nowrap' }}>Min. area</TableCell>
          <TableCell>Reason</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {products.map((p) => (
          <TableRow key={p.productId}>
            <TableCell sx={{ minWidth: 140 }}>
              <Typography variant="body2" sx={{ fontWeight: 600 }}>
                {p.sku}
                {p.active ? '' : ' (inactive)'}
              </Typography>
              <Typography variant="caption" color="text.secondary">
                {p.description}
              </Typography>
            </TableCell>
            <TableCell>
              <Chip
                size="small"
                label={p.severity}
                color={severityColor[p.severity] ?? 'default'}
              />
            </TableCell>
            <TableCell>{formatPercent(p.minAreaRatio)}</TableCell>
            <TableCell>{p.reason ?? '—'}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
