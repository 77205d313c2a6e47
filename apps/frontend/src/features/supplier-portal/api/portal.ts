import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { ApiError, api, isApiError } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { maxChars } from '@/lib/contract-rules';
import { TEXT_MIN } from '@gaugeproof/api-types';

interface PortalLot {
  poNumber: string;
  packingSlip: string | null;
  supplierLotCode: string | null;
  receivedOn: string;
  quantity: number;
  unit: string;
}

/** What GET /api/supplier-portal/:token shows for a return notice: that return only. */
export interface PortalReturn {
  kind: 'return';
  number: string;
  status: string;
  supplier: { name: string };
  note: string | null;
  rmaNumber: string | null;
  chargeback: { amount: number; currency: string };
  emailedOn: string | null;
  lots: PortalLot[];
  photos: { n: number; poNumber: string; width: number; height: number; takenOn: string }[];
  evidencePack: { number: string };
  linkExpiresAt: string;
}

/** What GET /api/supplier-portal/:token shows for a SCAR: one request, nothing internal. */
export interface PortalRequest {
  kind: 'corrective_action';
  number: string;
  status: 'open' | 'responded' | 'verified' | 'reopened' | 'closed';
  supplier: { name: string };
  problem: string;
  dueOn: string;
  lots: PortalLot[];
  reopenComment: string | null;
  answer: {
    containment: string | null;
    rootCause: string | null;
    correctiveAction: string | null;
    promisedOn: string | null;
    respondedAt: string | null;
  };
  canAnswer: boolean;
  attachments: { filename: string; contentType: string; sizeBytes: number; addedAt: string }[];
  evidencePack: { number: string } | null;
  linkExpiresAt: string;
}

const path = (token: string, rest = '') => `/supplier-portal/${encodeURIComponent(token)}${rest}`;
export type PortalPage = PortalRequest | PortalReturn;

/** Address of a return notice's photo n (1-based) on the public API. */
export const portalPhotoUrl = (token: string, n: number, size?: 'thumbnail') =>
  `/api${path(token, `/photos/${n}`)}${size ? `?size=${size}` : ''}`;
export const portalEvidenceUrl = (token: string) => `/api${path(token, '/evidence.pdf')}`;

export const usePortalRequest = (token: string) =>
  useQuery({
    queryKey: queryKeys.supplierPortal.request(token),
    queryFn: ({ signal }) => api.get<PortalPage>(path(token), signal),
    retry: (count, error) => !(isApiError(error) && error.status < 500) && count < 2,
    meta: { inlineErrors: true },
  });

const answer = (what: string) =>
  z
    .string()
    .trim()
    .min(TEXT_MIN.answer, `Describe the ${what} in at least ${TEXT_MIN.answer} characters.`)
    .max(...maxChars('long'));

/** The same rules as the server (SupplierResponseDto). */
export const answerSchema = z.object({
  containment: answer('containment'),
  rootCause: answer('root cause'),
  correctiveAction: answer('corrective action'),
  promisedOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick the date the fix will be in place.')
    .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)), 'Pick a real date.'),
});
export type AnswerInput = z.infer<typeof answerSchema>;

export function useSendAnswer(token: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: AnswerInput) => api.post<PortalRequest>(path(token, '/response'), input),
    meta: { inlineErrors: true },
    onSuccess: (data) => client.setQueryData(queryKeys.supplierPortal.request(token), data),
  });
}

/** 10 MB, as the server (supplier-portal.service.ts MAX_ATTACHMENT_BYTES). */
export const MAX_FILE_BYTES = 10 * 1024 * 1024;

export function useUploadFile(token: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      const res = await fetch(`/api${path(token, '/attachments')}`, {
        method: 'POST',
        body: form,
      });
      const body = (await res.json().catch(() => null)) as Record<string, unknown> | null;
      if (!res.ok) {
        throw new ApiError(
          res.status,
          body && typeof body.statusCode === 'number'
            ? (body as unknown as ConstructorParameters<typeof ApiError>[1])
            : null,
          res.statusText,
        );
      }
      return body;
    },
    meta: { inlineErrors: true },
    onSettled: () =>
      client.invalidateQueries({ queryKey: queryKeys.supplierPortal.request(token) }),
  });
}
