import { TEXT_MAX, type ReceivedBefore } from '@gaugeproof/api-types';
import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { useDebouncedValue } from '@/lib/use-debounced-value';

/** Wait this long after the last keystroke before asking (common practice, no source). */
const TYPING_PAUSE_MS = 400;

export const getReceivedBefore = (poNumber: string, packingSlip: string, signal?: AbortSignal) =>
  api.get<ReceivedBefore>(
    `/lots/received-before?poNumber=${encodeURIComponent(poNumber)}&packingSlip=${encodeURIComponent(packingSlip)}`,
    signal,
  );

/**
 * The lots already received under this PO and packing slip, asked while the clerk types so
 * the warning shows before saving (the server asks again on save). Off until both are filled.
 */
export function useReceivedBefore(poNumber: string, packingSlip: string) {
  const po = useDebouncedValue(poNumber.trim(), TYPING_PAUSE_MS);
  const slip = useDebouncedValue(packingSlip.trim(), TYPING_PAUSE_MS);
  const enabled =
    po.length > 0 &&
    slip.length > 0 &&
    po.length <= TEXT_MAX.reference &&
    slip.length <= TEXT_MAX.reference;
  const query = useQuery({
    queryKey: queryKeys.lots.receivedBefore(po, slip),
    queryFn: ({ signal }) => getReceivedBefore(po, slip, signal),
    enabled,
    meta: { inlineErrors: true },
  });
  // A warning for codes the clerk has since changed would name the wrong lots.
  const current = po === poNumber.trim() && slip === packingSlip.trim();
  return enabled && current ? (query.data?.lots ?? []) : [];
}
