import { Alert, Chip, Stack, Typography } from '@mui/material';
import type { ProductOption } from '@/features/lots/types';
import { claimedMaterialLabels, inSentence } from '@/lib/labels';

/** The conductors the label promises and the inspection policy the plan comes from. */
export function ProductDetails({ product }: { product: ProductOption }) {
  return (
    <Stack spacing={1} aria-label="Product details">
      <Typography variant="subtitle2">
        {product.kind === 'kit' ? 'Wiring kit' : 'Spool'}
        {product.lengthPerUnitM ? ` · ${product.lengthPerUnitM} m per unit` : ''} · inspection level{' '}
        {product.inspectionLevel}, AQL {product.aql}, minimum area{' '}
        {Math.round(product.minAreaRatio * 100)} % of nominal
      </Typography>
      <Stack direction="row" spacing={1} useFlexGap sx={{ flexWrap: 'wrap' }}>
        {product.conductors.map((c) => (
          <Chip
            key={c.id}
            variant="outlined"
            label={`${c.purpose}: ${c.gauge} ${inSentence(claimedMaterialLabels[c.claimedMaterial])}${c.claimedStrands ? `, ${c.claimedStrands} strands` : ''}`}
          />
        ))}
      </Stack>
      {product.warnings.map((warning) => (
        <Alert key={warning} severity="warning">
          {warning}
        </Alert>
      ))}
    </Stack>
  );
}
