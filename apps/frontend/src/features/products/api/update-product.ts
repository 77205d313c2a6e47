import { api } from '@/lib/api-client';
import type { ProductBody, ProductInput } from '@/features/products/api/create-product';
import type { Product } from '@/features/products/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

export type ProductPatch = Partial<Omit<ProductBody, 'supplierId' | 'sku' | 'kind'>> & {
  active?: boolean;
};

/** An edit of the product as loaded at `version`; a stale version is answered 409. */
export const updateProduct = ({
  id,
  version,
  patch,
}: {
  id: number;
  version: number;
  patch: ProductPatch;
}) => api.patch<Product>(`/products/${id}`, { version, ...patch });

/** A saved product as the form's text values. */
export function productToInput(product: Product): ProductInput {
  return {
    supplierId: String(product.supplier.id),
    sku: product.sku,
    kind: product.kind,
    description: product.description,
    lengthPerUnitM: product.lengthPerUnitM === null ? '' : String(product.lengthPerUnitM),
    inspectionLevel: product.inspectionLevel as ProductInput['inspectionLevel'],
    aql: product.aql as ProductInput['aql'],
    minAreaRatioPercent: String(Math.round(product.minAreaRatio * 10_000) / 100),
    conductors: [...product.conductors]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({
        purpose: c.purpose,
        gauge: c.gauge,
        claimedMaterial: c.claimedMaterial,
        claimedStrands: c.claimedStrands === null ? '' : String(c.claimedStrands),
      })),
  };
}

/** Only the fields that changed; the conductor list goes whole when any of it changed. */
export function productPatch(before: ProductBody, after: ProductBody): ProductPatch {
  const patch: ProductPatch = {};
  // Supplier, SKU and kind stay as created: lots are filed under them (PATCH refuses them).
  const keys = ['description', 'lengthPerUnitM', 'inspectionLevel', 'aql', 'minAreaRatio'] as const;
  for (const key of keys) {
    if (before[key] !== after[key]) Object.assign(patch, { [key]: after[key] });
  }
  if (JSON.stringify(before.conductors) !== JSON.stringify(after.conductors)) {
    patch.conductors = after.conductors;
  }
  return patch;
}

export function useUpdateProduct() {
  return useWriteMutation(updateProduct, {
    refresh: [queryKeys.products.all],
  });
}
