import { zodResolver } from '@hookform/resolvers/zod';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Stack,
  Typography,
} from '@mui/material';
import { useForm, useWatch } from 'react-hook-form';
import {
  EMPTY_PRODUCT,
  productSchema,
  toProductBody,
  useCreateProduct,
  type ProductInput,
} from '@/features/products/api/create-product';
import {
  productPatch,
  productToInput,
  useUpdateProduct,
} from '@/features/products/api/update-product';
import { ConductorFields } from '@/features/products/components/conductor-fields';
import { InspectionPolicyFields } from '@/features/products/components/inspection-policy-fields';
import { InspectionStateChip } from '@/features/products/components/inspection-state-chip';
import { ProductMainFields } from '@/features/products/components/product-main-fields';
import { kitWarnings } from '@/features/products/product-rules';
import type { Product } from '@/features/products/types';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

const FIELDS = [
  'supplierId',
  'sku',
  'kind',
  'description',
  'lengthPerUnitM',
  'inspectionLevel',
  'aql',
] as const;

interface ProductDialogProps {
  /** null: a new product. */
  product: Product | null;
  onClose: () => void;
}

export function ProductDialog({ product, onClose }: ProductDialogProps) {
  const create = useCreateProduct();
  const update = useUpdateProduct();
  const mutation = product ? update : create;
  const form = useForm<ProductInput>({
    resolver: zodResolver(productSchema),
    mode: 'onChange',
    defaultValues: product ? productToInput(product) : EMPTY_PRODUCT,
  });
  const { isSubmitting, errors } = form.formState;
  const conductors = useWatch({ control: form.control, name: 'conductors' });
  const liveWarnings = kitWarnings(conductors);
  const formErrors = mutation.isError ? splitServerErrors(mutation.error, FIELDS).formErrors : [];

  const onSubmit = form.handleSubmit(async (input) => {
    const body = toProductBody(input);
    try {
      const saved = product
        ? await update.mutateAsync({
            id: product.id,
            patch: productPatch(toProductBody(productToInput(product)), body),
          })
        : await create.mutateAsync(body);
      if (saved.warnings.length > 0) {
        toasts.show(`${saved.sku} saved. ${saved.warnings.join(' ')}`, 'warning');
      } else toasts.success(`${saved.sku} saved.`);
      onClose();
    } catch (error) {
      const { fieldErrors } = splitServerErrors(error, FIELDS);
      for (const field of FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });

  const title = product ? `Edit ${product.sku}` : 'New product';
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={onSubmit} aria-label={title}>
        <DialogTitle>{title}</DialogTitle>
        <DialogContent>
          {product && (
            <Stack direction="row" spacing={1} sx={{ alignItems: 'center', mb: 1 }}>
              <InspectionStateChip state={product.inspectionState} />
              <Typography variant="body2" color="text.secondary">
                {product.inspectionState.reason ?? 'No switch yet: lots are inspected as planned.'}
              </Typography>
            </Stack>
          )}
          {product?.warnings.map((warning) => (
            <Alert key={warning} severity="warning" sx={{ mb: 1 }}>
              {warning}
            </Alert>
          ))}
          {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
          <ProductMainFields control={form.control} locked={product !== null} />
          <Typography variant="subtitle1" sx={{ fontWeight: 600, mt: 2 }}>
            Inspection policy
          </Typography>
          <InspectionPolicyFields control={form.control} />
          <ConductorFields control={form.control} />
          {errors.conductors?.root?.message || errors.conductors?.message ? (
            <Alert severity="error">
              {errors.conductors.root?.message ?? errors.conductors.message}
            </Alert>
          ) : null}
          {liveWarnings.map((warning) => (
            <Alert key={warning} severity="warning" role="alert" sx={{ mt: 1 }}>
              {warning}
            </Alert>
          ))}
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" loading={isSubmitting}>
            {product ? 'Save' : 'Add product'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
