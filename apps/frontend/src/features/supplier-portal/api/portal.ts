import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, apiErrorOf, isApiError, parseAnswer } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { maxChars } from '@/lib/contract-rules';
import {
  MAX_ATTACHMENT_BYTES,
  TEXT_MIN,
  type PortalAttachment,
  type PortalReturnView,
  type PortalScarView,
  type PortalView,
} from '@gaugeproof/api-types';

/** What GET /api/supplier-portal/:token shows for a return notice: that return only. */
export type PortalReturn = PortalReturnView;

/** What GET /api/supplier-portal/:token shows for a SCAR: one request, nothing internal. */
export type PortalRequest = PortalScarView;

const path = (token: string, rest = '') => `/supplier-portal/${encodeURIComponent(token)}${rest}`;
/** The one request or return notice a link is for: the contract's shapes. */
export type PortalPage = PortalView;

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

/** The largest file a supplier attaches: the contract's limit, as the server checks it. */
export const MAX_FILE_BYTES = MAX_ATTACHMENT_BYTES;

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
      const body = parseAnswer(await res.text());
      if (!res.ok) throw apiErrorOf(res.status, body, res.statusText);
      return body as PortalAttachment;
    },
    meta: { inlineErrors: true },
    onSettled: () =>
      client.invalidateQueries({ queryKey: queryKeys.supplierPortal.request(token) }),
  });
}
