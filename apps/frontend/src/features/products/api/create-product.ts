import { AQLS, INSPECTION_LEVELS } from '@gaugeproof/standards';
import {
  CLAIMED_STRANDS,
  LENGTH_PER_UNIT_M,
  MIN_AREA_RATIO,
  parseDecimal,
  PRODUCT_CONDUCTORS,
} from '@gaugeproof/api-types';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { previewGauge } from '@/features/products/product-rules';
import {
  CLAIMED_MATERIALS,
  CONDUCTOR_PURPOSES,
  PRODUCT_KINDS,
  type Product,
} from '@/features/products/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

/** Empty, or a number (typed as the contract's parseDecimal reads it) that passes `test`. */
const optionalNumber = (test: (n: number) => boolean, message: string) =>
  z
    .string()
    .trim()
    .refine((v) => {
      if (v === '') return true;
      const n = parseDecimal(v);
      return n !== null && test(n);
    }, message);

export const conductorSchema = z.object({
  purpose: z.enum(CONDUCTOR_PURPOSES, 'Choose what the conductor is for.'),
  gauge: z.string().superRefine((value, ctx) => {
    const preview = previewGauge(value);
    if (!preview.ok) ctx.addIssue({ code: 'custom', message: preview.message });
  }),
  claimedMaterial: z.enum(CLAIMED_MATERIALS, 'Choose the material the label claims.'),
  claimedStrands: optionalNumber(
    (n) => Number.isInteger(n) && n >= CLAIMED_STRANDS.min && n <= CLAIMED_STRANDS.max,
    'A whole number of strands, or leave empty.',
  ),
});

/** The product form (create and edit). Numbers stay text until sent. */
export const productSchema = z.object({
  supplierId: z.string().min(1, 'Choose the supplier.'),
  sku: z
    .string()
    .trim()
    .min(1, 'Enter the SKU.')
    .max(...maxChars('reference')),
  kind: z.enum(PRODUCT_KINDS, 'Choose spool or kit.'),
  description: z
    .string()
    .trim()
    .min(1, 'Describe the product, e.g. “4 AWG power cable, red, 30 m spool”.')
    .max(...maxChars('description')),
  lengthPerUnitM: optionalNumber(
    (n) => n >= LENGTH_PER_UNIT_M.min && n <= LENGTH_PER_UNIT_M.max,
    `A length in metres from ${LENGTH_PER_UNIT_M.min} to ${LENGTH_PER_UNIT_M.max}, or leave empty.`,
  ),
  inspectionLevel: z.enum(INSPECTION_LEVELS, 'Choose an inspection level.'),
  aql: z.enum(AQLS, 'Choose an AQL from the tables.'),
  // Policy per product, default 98 % (ASTM B496 area acceptance; REFERENCE §3).
  minAreaRatioPercent: z
    .string()
    .trim()
    .refine(
      (v) => {
        const n = parseDecimal(v);
        return n !== null && n >= MIN_AREA_RATIO.min * 100 && n <= MIN_AREA_RATIO.max * 100;
      },
      `A percentage from ${MIN_AREA_RATIO.min * 100} to ${MIN_AREA_RATIO.max * 100}.`,
    ),
  conductors: z
    .array(conductorSchema)
    .min(PRODUCT_CONDUCTORS.min, 'Add at least one conductor.')
    .max(PRODUCT_CONDUCTORS.max, `At most ${PRODUCT_CONDUCTORS.max} conductors.`),
});
export type ProductInput = z.infer<typeof productSchema>;
export type ConductorInput = z.infer<typeof conductorSchema>;

export const EMPTY_CONDUCTOR: ConductorInput = {
  purpose: 'power',
  gauge: '',
  claimedMaterial: 'copper',
  claimedStrands: '',
};

export const EMPTY_PRODUCT: ProductInput = {
  supplierId: '',
  sku: '',
  kind: 'spool',
  description: '',
  lengthPerUnitM: '',
  inspectionLevel: 'S-3', // samples are destroyed: a special level of ISO 2859-1 (issue 4)
  aql: '1.0',
  minAreaRatioPercent: '98',
  conductors: [EMPTY_CONDUCTOR],
};

export interface ProductBody {
  supplierId: number;
  sku: string;
  kind: Product['kind'];
  description: string;
  lengthPerUnitM: number | null;
  inspectionLevel: string;
  aql: string;
  minAreaRatio: number;
  conductors: {
    purpose: ConductorInput['purpose'];
    gauge: string;
    claimedMaterial: ConductorInput['claimedMaterial'];
    claimedStrands: number | null;
  }[];
}

export function toProductBody(input: ProductInput): ProductBody {
  return {
    supplierId: Number(input.supplierId),
    sku: input.sku.trim(),
    kind: input.kind,
    description: input.description.trim(),
    lengthPerUnitM: parseDecimal(input.lengthPerUnitM),
    inspectionLevel: input.inspectionLevel,
    aql: input.aql,
    minAreaRatio: (parseDecimal(input.minAreaRatioPercent) ?? Number.NaN) / 100,
    conductors: input.conductors.map((c) => {
      const preview = previewGauge(c.gauge);
      return {
        purpose: c.purpose,
        gauge: preview.ok ? preview.gauge.label : c.gauge.trim(),
        claimedMaterial: c.claimedMaterial,
        claimedStrands: parseDecimal(c.claimedStrands),
      };
    }),
  };
}

export const createProduct = (body: ProductBody) => api.post<Product>('/products', body);

export function useCreateProduct() {
  return useWriteMutation(createProduct, {
    refresh: [queryKeys.products.all],
  });
}
