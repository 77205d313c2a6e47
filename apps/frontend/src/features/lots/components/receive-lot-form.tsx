import { zodResolver } from '@hookform/resolvers/zod';
import { Alert, Button, Grid, InputAdornment, MenuItem, Stack, TextField } from '@mui/material';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { useNavigate } from 'react-router';
import { ScanButton } from '@/components/scanner/scan-button';
import {
  FORMAT_LABELS,
  fieldText,
  lotOfTag,
  type ScannedCode,
} from '@/components/scanner/scan-codes';
import { paths } from '@/config/paths';
import {
  CREATE_LOT_FIELDS,
  createLotSchema,
  LOT_UNITS,
  toCreateLotRequest,
  useCreateLot,
  type CreateLotForm,
} from '@/features/lots/api/create-lot';
import { useReceivedBefore } from '@/features/lots/api/get-received-before';
import { AlreadyReceivedAlert } from '@/features/lots/components/already-received-alert';
import { PlanPanel } from '@/features/lots/components/plan-panel';
import { ProductAutocomplete } from '@/features/lots/components/product-autocomplete';
import { ProductDetails } from '@/features/lots/components/product-details';
import { SupplierAutocomplete } from '@/features/lots/components/supplier-autocomplete';
import { SupplierStatusAlert } from '@/features/lots/components/supplier-status-alert';
import type { LotSummary, ProductOption, SupplierOption } from '@/features/lots/types';
import { isApiError } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { splitServerErrors } from '@/lib/server-field-errors';
import { toasts } from '@/lib/toast-store';

type CodeField = 'poNumber' | 'packingSlip' | 'supplierLotCode';
/** The longest code a field keeps (createLotSchema). */
const CODE_MAX = 64;

const EMPTY: CreateLotForm = {
  supplierId: 0,
  productId: 0,
  poNumber: '',
  packingSlip: '',
  supplierLotCode: '',
  quantity: '',
  unit: 'spools',
  notes: '',
};

export function ReceiveLotForm({ onReceived }: { onReceived: (lot: LotSummary) => void }) {
  const create = useCreateLot();
  const navigate = useNavigate();
  const [supplier, setSupplier] = useState<SupplierOption | null>(null);
  const [product, setProduct] = useState<ProductOption | null>(null);
  const form = useForm<CreateLotForm>({
    resolver: zodResolver(createLotSchema),
    mode: 'onChange',
    defaultValues: EMPTY,
  });
  const { errors, isSubmitting } = form.formState;
  const quantityText = form.watch('quantity');
  const unit = form.watch('unit');
  const poNumber = form.watch('poNumber');
  const packingSlip = form.watch('packingSlip');
  const queryClient = useQueryClient();
  const earlier = useReceivedBefore(poNumber, packingSlip);
  const [receiveAgain, setReceiveAgain] = useState(false);
  const earlierIds = earlier.map((l) => l.id).join(',');
  // A tick is for the lots it was given on: other codes, other lots, ask again.
  useEffect(() => setReceiveAgain(false), [earlierIds]);
  const formErrors = create.isError
    ? splitServerErrors(create.error, CREATE_LOT_FIELDS).formErrors
    : [];

  const chooseSupplier = (next: SupplierOption | null) => {
    setSupplier(next);
    setProduct(null);
    form.setValue('supplierId', next?.id ?? 0, { shouldValidate: true });
    form.setValue('productId', 0);
  };
  const chooseProduct = (next: ProductOption | null) => {
    setProduct(next);
    form.setValue('productId', next?.id ?? 0, { shouldValidate: true });
    if (next)
      form.setValue('unit', next.kind === 'kit' ? 'kits' : 'spools', { shouldValidate: true });
  };

  const onSubmit = form.handleSubmit(async (values) => {
    if (earlier.length > 0 && !receiveAgain) {
      form.setError('packingSlip', {
        type: 'already-received',
        message: `Already received as lot ${earlierIds.replace(/,/g, ', ')}: open it, or tick "receive it again" below.`,
      });
      return;
    }
    try {
      onReceived(await create.mutateAsync(toCreateLotRequest(values, receiveAgain)));
    } catch (error) {
      // Received meanwhile (or typed faster than the look-up): show the lots it names.
      if (isApiError(error) && error.status === 409) {
        void queryClient.invalidateQueries({
          queryKey: queryKeys.lots.receivedBefore(
            values.poNumber.trim(),
            values.packingSlip.trim(),
          ),
        });
      }
      const { fieldErrors } = splitServerErrors(error, CREATE_LOT_FIELDS);
      for (const field of CREATE_LOT_FIELDS) {
        const message = fieldErrors[field];
        if (message) form.setError(field, { type: 'server', message });
      }
    }
  });

  // A scanned label fills its field; our own hold tag opens its lot instead (issue 15).
  const scanned = (name: CodeField, label: string) => (code: ScannedCode) => {
    const tag = lotOfTag(code.text, window.location.origin);
    if (tag) {
      toasts.show(`That is the tag of lot ${tag.lotId}; it is open now.`);
      void navigate(tag.bench ? paths.lotBench.getHref(tag.lotId) : paths.lot.getHref(tag.lotId));
      return;
    }
    form.setValue(name, fieldText(code.text, CODE_MAX), {
      shouldValidate: true,
      shouldDirty: true,
    });
    toasts.success(`${label} read from the ${FORMAT_LABELS[code.format] ?? 'code'}.`);
  };

  const text = (name: CodeField, label: string, scanLabel: string, required = false) => (
    <TextField
      label={label}
      required={required}
      fullWidth
      error={!!errors[name]}
      helperText={errors[name]?.message}
      slotProps={{
        // A scanned value is set without a keystroke: lift the label over it.
        inputLabel: form.watch(name) ? { shrink: true } : undefined,
        input: {
          endAdornment: (
            <InputAdornment position="end">
              <ScanButton label={scanLabel} onCode={scanned(name, label)} />
            </InputAdornment>
          ),
        },
      }}
      {...form.register(name)}
    />
  );

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Receive a delivery">
      <Grid container spacing={3}>
        <Grid size={{ xs: 12, md: 7 }}>
          <Stack spacing={2}>
            {formErrors.length > 0 && <Alert severity="error">{formErrors.join(' ')}</Alert>}
            <SupplierAutocomplete
              value={supplier}
              onChange={chooseSupplier}
              error={errors.supplierId?.message}
            />
            {supplier && <SupplierStatusAlert supplier={supplier} />}
            <ProductAutocomplete
              supplierId={supplier?.id ?? null}
              value={product}
              onChange={chooseProduct}
              error={errors.productId?.message}
            />
            {product && <ProductDetails product={product} />}
            {text('poNumber', 'PO number', 'Scan the PO number', true)}
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
              {text('packingSlip', 'Packing-slip number', 'Scan the packing slip')}
              {text('supplierLotCode', 'Supplier lot code', 'Scan the supplier lot label')}
            </Stack>
            {earlier.length > 0 && (
              <AlreadyReceivedAlert
                poNumber={poNumber}
                packingSlip={packingSlip}
                lots={earlier}
                receiveAgain={receiveAgain}
                onReceiveAgainChange={(next) => {
                  setReceiveAgain(next);
                  if (next) form.clearErrors('packingSlip');
                }}
              />
            )}
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
              <TextField
                label="Quantity received"
                required
                fullWidth
                inputMode="numeric"
                error={!!errors.quantity}
                helperText={
                  errors.quantity?.message ?? 'Units on the packing slip; the plan follows from it.'
                }
                {...form.register('quantity')}
              />
              <Controller
                control={form.control}
                name="unit"
                render={({ field, fieldState }) => (
                  <TextField
                    select
                    label="Unit"
                    fullWidth
                    {...field}
                    error={!!fieldState.error}
                    helperText={fieldState.error?.message}
                  >
                    {LOT_UNITS.map((u) => (
                      <MenuItem key={u} value={u}>
                        {u}
                      </MenuItem>
                    ))}
                  </TextField>
                )}
              />
            </Stack>
            <TextField
              label="Notes"
              multiline
              minRows={2}
              error={!!errors.notes}
              helperText={
                errors.notes?.message ?? 'Damage, short delivery, anything the QA lead should know.'
              }
              {...form.register('notes')}
            />
            <div>
              <Button type="submit" variant="contained" size="large" loading={isSubmitting}>
                {earlier.length > 0 && receiveAgain
                  ? 'Receive again and hold the new lot'
                  : 'Receive and hold the lot'}
              </Button>
            </div>
          </Stack>
        </Grid>
        <Grid size={{ xs: 12, md: 5 }}>
          <PlanPanel product={product} quantityText={quantityText} unit={unit} />
        </Grid>
      </Grid>
    </form>
  );
}
