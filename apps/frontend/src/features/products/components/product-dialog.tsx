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
import { createOrUpdate, useVersionedEdit } from '@/components/form/use-versioned-edit';
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
  /**
   * May set acceptance criteria (a QA lead or an admin). Others see them disabled: on a new
   * product the defaults, on an edit also the conductors (the server refuses both).
   */
  canSetCriteria: boolean;
  onClose: () => void;
}

export function ProductDialog({ product, canSetCriteria, onClose }: ProductDialogProps) {
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
  const conductorsLocked = !canSetCriteria && product !== null;
  const edit = useVersionedEdit({
    form,
    fields: FIELDS,
    record: product,
    toInput: productToInput,
    mutation,
    what: 'this product',
    save: async (input, base, version) => {
      const saved = await createOrUpdate(base, version, toProductBody(input), {
        create: create.mutateAsync,
        update: update.mutateAsync,
        patch: (body, from) => productPatch(toProductBody(productToInput(from)), body),
      });
      if (saved.warnings.length > 0) {
        toasts.show(`${saved.sku} saved. ${saved.warnings.join(' ')}`, 'warning');
      } else toasts.success(`${saved.sku} saved.`);
      onClose();
    },
  });

  const title = product ? `Edit ${product.sku}` : 'New product';
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <form noValidate onSubmit={edit.onSubmit} aria-label={title}>
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
          {edit.alerts}
          <ProductMainFields control={form.control} locked={product !== null} />
          <Typography variant="subtitle1" sx={{ fontWeight: 600, mt: 2 }}>
            Inspection policy
          </Typography>
          {!canSetCriteria && (
            <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
              {product
                ? 'Inspection level, AQL, minimum area and the conductors are acceptance criteria: only a QA lead or an administrator can change them.'
                : 'A new product starts on the default inspection level, AQL and minimum area; only a QA lead or an administrator can change them.'}
            </Typography>
          )}
          <InspectionPolicyFields control={form.control} disabled={!canSetCriteria} />
          <ConductorFields control={form.control} disabled={conductorsLocked} />
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
