import type { LotDetail } from '@/features/inspection/types';
import type { PhotoSampleOption } from '@/features/photos/types';

/** The lot's samples as the photo picker names them ("Unit 2 · power 4 AWG"). */
export function photoSampleOptions(lot: LotDetail): PhotoSampleOption[] {
  return lot.samples.map((s) => {
    const conductor = lot.product.conductors.find((c) => c.id === s.conductorId);
    return {
      id: s.id,
      label: `Unit ${s.seq} · ${conductor ? `${conductor.purpose} ${conductor.gauge}` : 'conductor'}`,
    };
  });
}
