import { Button } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { WorkListCard } from '@/components/work-list/work-list-card';
import { paths } from '@/config/paths';
import { useUnreturnedLots } from '@/features/returns/api/get-unreturned-lots';
import { countOf } from '@/lib/counts';

const DAY_MS = 86_400_000;

function waited(iso: string | null): string {
  if (!iso) return '';
  const days = Math.floor((Date.now() - Date.parse(iso)) / DAY_MS);
  return days < 1 ? 'rejected today' : `rejected ${days} day${days === 1 ? '' : 's'} ago`;
}

/** Today, for purchasing: rejected lots that are on no return yet, the oldest first. */
export function UnreturnedLotsSection() {
  const lots = useUnreturnedLots();
  return (
    <WorkListCard
      title="Rejected, not yet returned"
      countLabel={(n) => `${n} without a return`}
      urgent={false}
      query={lots}
      more={lots.data?.more}
      listLabel="Rejected lots without a return"
      noWrap
      items={
        lots.isSuccess
          ? lots.data.items.map((l) => ({
              key: l.id,
              primary: (
                <RouterLink to={paths.lot.getHref(l.id)}>
                  Lot {l.id} · {l.supplier.name}
                </RouterLink>
              ),
              secondary: `PO ${l.poNumber} · ${l.product.sku} · ${countOf(l.quantity, l.unit)} · ${waited(l.rejectedAt)}`,
              action: (
                <Button
                  size="small"
                  variant="outlined"
                  component={RouterLink}
                  to={paths.returns.getHref({ lotId: l.id, supplierId: l.supplier.id })}
                  aria-label={`Raise a return for lot ${l.id}`}
                >
                  Raise a return
                </Button>
              ),
            }))
          : undefined
      }
      emptyText="Every rejected lot is on a return."
    />
  );
}
