import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SamplingPlanAnswer } from '@/features/lots/types';
import { queryKeys } from '@/lib/query-keys';

export const getSamplingPlan = (productId: number, quantity: number, signal?: AbortSignal) =>
  api.get<SamplingPlanAnswer>(
    `/products/${productId}/sampling-plan?quantity=${encodeURIComponent(quantity)}`,
    signal,
  );

export const samplingPlanQueryOptions = (productId: number, quantity: number) =>
  queryOptions({
    queryKey: queryKeys.products.samplingPlan(productId, quantity),
    queryFn: ({ signal }) => getSamplingPlan(productId, quantity, signal),
    // The form shows its own preview and the server's error beside it.
    meta: { inlineErrors: true },
  });

/** The server's plan for a lot size; off until there is a product and a whole quantity ≥ 1. */
export function useSamplingPlan(productId: number | null, quantity: number | null) {
  const enabled =
    productId !== null && quantity !== null && Number.isInteger(quantity) && quantity >= 1;
  return useQuery({
    ...samplingPlanQueryOptions(productId ?? 0, quantity ?? 0),
    enabled,
  });
}
