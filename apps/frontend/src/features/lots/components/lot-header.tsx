import { Alert, Card, CardContent, Grid, Stack, Typography } from '@mui/material';
import { HoldBanner } from '@/features/lots/components/hold-banner';
import type { ReactNode } from 'react';
import { LotStatusChip } from '@/features/lots/components/lot-status-chip';
import { SamplingPlanSummary } from '@/features/lots/components/sampling-plan-summary';
import { SupplierStatusAlert } from '@/features/lots/components/supplier-status-alert';
import { countOf } from '@/lib/counts';
import type { LotSummary } from '@/features/lots/types';
import { formatDateTime } from '@/lib/dates';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <div>
      <Typography variant="caption" color="text.secondary">
        {label}
      </Typography>
      <Typography>{value}</Typography>
    </div>
  );
}

interface LotHeaderProps {
  lot: LotSummary & { notes?: string | null; supplierWarning?: string | null };
  /** Buttons beside the title (bench mode). */
  actions?: ReactNode;
}

export function LotHeader({ lot, actions }: LotHeaderProps) {
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
        <Typography variant="h1">Lot {lot.id}</Typography>
        <LotStatusChip status={lot.status} size="medium" />
        {actions}
      </Stack>
      <HoldBanner status={lot.status} />
      {lot.supplierWarning ? (
        <Alert severity="error">{lot.supplierWarning}</Alert>
      ) : (
        <SupplierStatusAlert supplier={lot.supplier} />
      )}
      <Card>
        <CardContent>
          <Grid container spacing={3}>
            <Grid size={{ xs: 12, md: 6 }}>
              <Grid container spacing={2}>
                <Grid size={6}>
                  <Fact label="PO number" value={lot.poNumber} />
                </Grid>
                <Grid size={6}>
                  <Fact label="Packing slip" value={lot.packingSlip ?? '—'} />
                </Grid>
                <Grid size={6}>
                  <Fact label="Supplier" value={`${lot.supplier.name} (${lot.supplier.code})`} />
                </Grid>
                <Grid size={6}>
                  <Fact label="Supplier lot code" value={lot.supplierLotCode ?? '—'} />
                </Grid>
                <Grid size={12}>
                  <Fact label="Product" value={`${lot.product.sku} — ${lot.product.description}`} />
                </Grid>
                <Grid size={6}>
                  <Fact label="Quantity" value={countOf(lot.quantity, lot.unit)} />
                </Grid>
                <Grid size={6}>
                  <Fact
                    label="Received"
                    value={`${formatDateTime(lot.receivedAt)} by ${lot.receivedBy.name}`}
                  />
                </Grid>
                {lot.notes && (
                  <Grid size={12}>
                    <Fact label="Notes" value={lot.notes} />
                  </Grid>
                )}
              </Grid>
            </Grid>
            <Grid size={{ xs: 12, md: 6 }}>
              <SamplingPlanSummary plan={lot.samplingPlan} unit={lot.unit} />
            </Grid>
          </Grid>
        </CardContent>
      </Card>
    </Stack>
  );
}
