import { WorkListCard } from '@/components/work-list/work-list-card';
import { paths } from '@/config/paths';
import { useConcessionsAwaitingApproval } from '@/features/decisions/api/concessions';
import { formatCalendarDate, formatDateTime } from '@/lib/dates';
import { countOf } from '@/lib/counts';

/**
 * Concessions against a reject that wait for a second QA lead or an admin: the ones the
 * signed-in user may approve (their own requests are left out). Nothing is decided on
 * those lots until someone approves or refuses.
 */
export function ConcessionsAwaitingSection() {
  const awaiting = useConcessionsAwaitingApproval();
  return (
    <WorkListCard
      title="Concessions awaiting your approval"
      countLabel={(n) => `${n} concessions awaiting your approval`}
      query={awaiting}
      items={awaiting.data?.items.map((c) => ({
        key: c.id,
        href: paths.lot.getHref(c.lot.id),
        primary: `Lot ${c.lot.id} · ${c.lot.product.sku} · PO ${c.lot.poNumber} · ${c.lot.supplier.name}`,
        secondary: `Asked by ${c.requestedBy.name} on ${formatDateTime(c.requestedAt)}: ${countOf(c.quantity, c.unit)} for ${c.scope}, until ${formatCalendarDate(c.expiresOn)}. Approve or refuse it on the lot.`,
      }))}
      emptyText="No concession waits for your approval."
    />
  );
}
