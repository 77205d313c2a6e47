import { Button } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { WorkListCard } from '@/components/work-list/work-list-card';
import { paths } from '@/config/paths';
import { useLots } from '@/features/lots/api/get-lots';
import type { LotStatus } from '@/features/lots/types';
import { countOf } from '@/lib/counts';
import { formatDate } from '@/lib/dates';

interface TodayLotsSectionProps {
  title: string;
  status: LotStatus;
  /** What the empty list means for the user ("Nothing is waiting on the dock."). */
  emptyText: string;
}

const daysAgo = (iso: string) => Math.floor((Date.now() - new Date(iso).getTime()) / 86_400_000);

/** The ten oldest lots in one status, oldest first: the order work should be done in. */
export function TodayLotsSection({ title, status, emptyText }: TodayLotsSectionProps) {
  const lots = useLots({ status: [status], pageSize: 10, sort: 'receivedAt:asc' });
  const total = lots.data?.total;
  const shown = lots.data?.items.length ?? 0;
  return (
    <WorkListCard
      title={title}
      countLabel={(n) => `${n} lots`}
      tone="primary"
      query={lots}
      total={total}
      loadingLabel={`Loading ${title.toLowerCase()}`}
      items={
        lots.isSuccess
          ? lots.data.items.map((lot) => {
              const age = daysAgo(lot.receivedAt);
              return {
                key: lot.id,
                href: paths.lot.getHref(lot.id),
                primary: `Lot ${lot.id} · ${lot.product.sku} · PO ${lot.poNumber}`,
                secondary: `${lot.supplier.name} · ${countOf(lot.quantity, lot.unit)} · received ${formatDate(lot.receivedAt)}${age >= 1 ? ` (${age} d ago)` : ''}`,
              };
            })
          : undefined
      }
      emptyText={emptyText}
      footer={
        total !== undefined &&
        total > 0 && (
          <Button
            component={RouterLink}
            to={paths.lots.getHref(status)}
            size="small"
            sx={{ mt: 1 }}
          >
            {total > shown ? `All ${total} in the Lots list` : 'Open in the Lots list'}
          </Button>
        )
      }
    />
  );
}
