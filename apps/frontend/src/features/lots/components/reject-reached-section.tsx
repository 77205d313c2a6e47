import { WorkListCard } from '@/components/work-list/work-list-card';
import { paths } from '@/config/paths';
import { useRejectReachedLots } from '@/features/lots/api/get-reject-reached';

/**
 * Lots whose nonconforming units already reach the plan's reject number: nothing more can
 * make them acceptable (curtailed rejection), so they wait only for the QA lead's decision.
 */
export function RejectReachedSection() {
  const lots = useRejectReachedLots();
  return (
    <WorkListCard
      title="At the reject number"
      countLabel={(n) => `${n} lots at the reject number`}
      query={lots}
      total={lots.data?.total}
      items={lots.data?.items.map((lot) => ({
        key: lot.id,
        href: paths.lot.getHref(lot.id),
        primary: `Lot ${lot.id} · ${lot.product.sku} · PO ${lot.poNumber}`,
        secondary: `${lot.supplier.name} · ${lot.nonconformingUnits} nonconforming unit${lot.nonconformingUnits === 1 ? '' : 's'}, reject at ${lot.reject}: decide it now`,
      }))}
      emptyText="No lot has reached its reject number."
    />
  );
}
