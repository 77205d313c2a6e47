import { Stack, Typography } from '@mui/material';
import { SectionBoundary } from '@/components/section-boundary';
import { useSessionUser } from '@/features/auth/auth-context';
import { ProductsPanel } from '@/features/products/components/products-panel';

export function ProductsRoute() {
  const user = useSessionUser();
  const canWrite = user.role !== 'clerk'; // qa_lead, purchasing, admin; the server decides
  // Acceptance criteria belong to QA (issue 17): purchasing edits the rest of a product.
  const canSetCriteria = user.role === 'qa_lead' || user.role === 'admin';
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Products</Typography>
        <Typography color="text.secondary">
          Each SKU bought from a supplier: its conductors as labelled and how its lots are
          inspected.
        </Typography>
      </div>
      <SectionBoundary name="product list">
        <ProductsPanel canWrite={canWrite} canSetCriteria={canSetCriteria} />
      </SectionBoundary>
    </Stack>
  );
}
