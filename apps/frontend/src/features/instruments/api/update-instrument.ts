import { api } from '@/lib/api-client';
import type { InstrumentBody } from '@/features/instruments/api/create-instrument';
import type { Instrument } from '@/features/instruments/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

export type InstrumentPatch = Partial<InstrumentBody> & { active?: boolean };

/** An edit of the instrument as loaded at `version`; a stale version is answered 409. */
export const updateInstrument = ({
  id,
  version,
  patch,
}: {
  id: number;
  version: number;
  patch: InstrumentPatch;
}) => api.patch<Instrument>(`/instruments/${id}`, { version, ...patch });

export function instrumentPatch(before: Instrument, after: InstrumentBody): InstrumentPatch {
  const patch: InstrumentPatch = {};
  for (const key of Object.keys(after) as (keyof InstrumentBody)[]) {
    if (after[key] !== before[key]) Object.assign(patch, { [key]: after[key] });
  }
  return patch;
}

export function useUpdateInstrument() {
  return useWriteMutation(updateInstrument, {
    refresh: [queryKeys.instruments.all],
    // A 409 means the list shows an old copy: load it again either way.
    refreshOnError: true,
  });
}
