import { Alert, Box, Button, Stack, Typography } from '@mui/material';
import { useEffect } from 'react';
import { Link as RouterLink, useParams } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { useSessionUser } from '@/features/auth/auth-context';
import { useInstruments } from '@/features/inspection/api/get-instruments';
import { useLot } from '@/features/inspection/api/get-lot';
import { BenchPanel } from '@/features/inspection/components/bench/bench-panel';
import { HoldBanner } from '@/features/lots/components/hold-banner';
import { PhotosPanel } from '@/features/photos/components/photos-panel';
import { LotStatusChip } from '@/features/lots/components/lot-status-chip';
import { isApiError } from '@/lib/api-client';
import type { Role } from '@/lib/roles';
import { errorMessage } from '@/lib/query-client';
import { lotLoadFallback } from './lot-load-fallback';
import { photoSampleOptions } from './photo-sample-options';

const RECORDERS: readonly Role[] = ['clerk', 'qa_lead', 'admin'];
const OPEN_STATUSES = ['on_hold', 'inspecting', 'awaiting_decision'];

/**
 * Bench mode keeps the app shell in a service worker so the page reloads on a patchy
 * network; registered here, not on the first screen (its code loads only now).
 */
function useAppShellCache() {
  useEffect(() => {
    if (!('serviceWorker' in navigator) || import.meta.env.DEV || import.meta.env.MODE === 'test')
      return;
    void import('virtual:pwa-register').then(({ registerSW }) => registerSW({ immediate: true }));
  }, []);
}

/** Bench mode of a lot: phone and tablet first, one piece at a time (issue 15). */
export function LotBenchRoute() {
  useAppShellCache();
  const { id } = useParams();
  const lotId = Number(id);
  const user = useSessionUser();
  const lot = useLot(lotId);
  const instruments = useInstruments({ active: true });

  if (
    !Number.isInteger(lotId) ||
    lotId <= 0 ||
    (lot.isError && isApiError(lot.error) && lot.error.status === 404)
  ) {
    return <Alert severity="info">There is no lot {id}.</Alert>;
  }
  // The bench starts from the instruments remembered on this device: wait for the register.
  const fallback = lotLoadFallback(lot, lotId, instruments.isPending);
  if (fallback || !lot.data) return fallback;
  const data = lot.data;
  const canRecord = OPEN_STATUSES.includes(data.status) && RECORDERS.includes(user.role);
  return (
    <Box sx={{ maxWidth: 720, mx: 'auto' }}>
      <Stack spacing={2}>
        <Stack
          direction="row"
          spacing={1}
          sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 1 }}
        >
          <Typography variant="h5" component="h1" sx={{ fontWeight: 700 }}>
            Lot {data.id} · bench
          </Typography>
          <LotStatusChip status={data.status} />
          <Box sx={{ flexGrow: 1 }} />
          <Button size="small" component={RouterLink} to={paths.lot.getHref(data.id)}>
            Lot page
          </Button>
        </Stack>
        <Typography variant="body2" color="text.secondary">
          {data.product.sku} — {data.product.description} · PO {data.poNumber} ·{' '}
          {data.supplier.name}
        </Typography>
        <HoldBanner status={data.status} compact />
        {canRecord && instruments.isError && (
          <Alert severity="error">
            The instrument register cannot be loaded: {errorMessage(instruments.error)}
          </Alert>
        )}
        <SectionBoundary name="bench">
          <BenchPanel
            lot={data}
            instruments={instruments.data?.items ?? []}
            canRecord={canRecord}
            user={user}
          />
        </SectionBoundary>
        {RECORDERS.includes(user.role) && (
          <SectionBoundary name="photos">
            <PhotosPanel
              lotId={data.id}
              photos={data.photos}
              samples={photoSampleOptions(data)}
              canUpload
              canVoid={(p) =>
                user.role !== 'clerk' ||
                // A clerk voids their own photo until the lot is decided.
                (OPEN_STATUSES.includes(data.status) && p.uploadedBy?.id === user.id)
              }
            />
          </SectionBoundary>
        )}
      </Stack>
    </Box>
  );
}
