import { createReading } from '@/features/inspection/api/create-reading';
import { createSample } from '@/features/inspection/api/create-sample';
import type { ReadingRequest } from '@/features/inspection/lib/reading-form';
import type { Reading } from '@/features/inspection/types';

/** Which planned piece a bench reading is for; the sample is made on the first reading. */
export interface BenchPiece {
  lotId: number;
  conductorId: number;
  seq: number;
  /** The piece's sample when it already exists on the server. */
  sampleId?: number;
}

/** Cuts the piece's sample if it has none yet, then records the reading on it. */
export async function recordBenchReading(
  piece: BenchPiece,
  request: ReadingRequest,
): Promise<Reading> {
  const sampleId =
    piece.sampleId ??
    (await createSample(piece.lotId, { conductorId: piece.conductorId, seq: piece.seq })).id;
  return createReading(sampleId, request);
}
