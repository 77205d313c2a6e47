import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InstrumentBody } from '@/features/instruments/api/create-instrument';
import type { Instrument } from '@/features/instruments/types';
import { queryKeys } from '@/lib/query-keys';

export type InstrumentPatch = Partial<InstrumentBody> & { active?: boolean };

export const updateInstrument = ({ id, patch }: { id: number; patch: InstrumentPatch }) =>
  api.patch<Instrument>(`/instruments/${id}`, patch);

export function instrumentPatch(before: Instrument, after: InstrumentBody): InstrumentPatch {
  const patch: InstrumentPatch = {};
  for (const key of Object.keys(after) as (keyof InstrumentBody)[]) {
    if (after[key] !== before[key]) Object.assign(patch, { [key]: after[key] });
  }
  return patch;
}

export function useUpdateInstrument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateInstrument,
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.instruments.all }),
  });
}
