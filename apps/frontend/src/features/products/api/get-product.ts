import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Product } from '@/features/products/types';
import { queryKeys } from '@/lib/query-keys';

export const getProduct = (id: number, signal?: AbortSignal) =>
  api.get<Product>(`/products/${id}`, signal);

export const productQueryOptions = (id: number) =>
  queryOptions({
    queryKey: queryKeys.products.detail(id),
    queryFn: ({ signal }) => getProduct(id, signal),
  });

export const useProduct = (id: number | null) =>
  useQuery({ ...productQueryOptions(id ?? 0), enabled: id !== null });
