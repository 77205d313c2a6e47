import { Stack, Typography } from '@mui/material';
import { useNavigate } from 'react-router';
import { SectionBoundary } from '@/components/section-boundary';
import { paths } from '@/config/paths';
import { ReceiveLotForm } from '@/features/lots/components/receive-lot-form';
import { toasts } from '@/lib/toast-store';

export function ReceivingRoute() {
  const navigate = useNavigate();
  return (
    <Stack spacing={2}>
      <div>
        <Typography variant="h1">Receiving</Typography>
        <Typography color="text.secondary">
          Log a delivery against its purchase order. It is held until inspected and decided.
        </Typography>
      </div>
      <SectionBoundary name="receiving form">
        <ReceiveLotForm
          onReceived={(lot) => {
            toasts.success(`Lot ${lot.id} received and put on hold.`);
            void navigate(paths.lot.getHref(lot.id));
          }}
        />
      </SectionBoundary>
    </Stack>
  );
}
