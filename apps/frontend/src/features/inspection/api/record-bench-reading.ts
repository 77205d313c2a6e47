import { createReading } from '@/features/inspection/api/create-reading';
import { createSample } from '@/features/inspection/api/create-sample';
import {
  enqueue,
  isTakenBy,
  newClientId,
  queuedFor,
  remove,
  update,
  type QueuedReading,
  type Recorder,
} from '@/features/inspection/lib/offline-queue';
import type { ReadingRequest } from '@/features/inspection/lib/reading-form';
import type { Reading } from '@/features/inspection/types';
import { isApiError } from '@/lib/api-client';

/** Which planned piece a bench reading is for; the sample is made on the first reading. */
export interface BenchPiece {
  lotId: number;
  conductorId: number;
  seq: number;
  /** The piece's sample when it already exists on the server. */
  sampleId?: number;
  /** "Unit 2 · Power 4 AWG". */
  label: string;
}

/** No answer at all (offline, connection dropped) or a gateway that could not reach us. */
export function isNetworkFailure(error: unknown): boolean {
  if (isApiError(error)) return [0, 502, 503, 504].includes(error.status);
  return error instanceof TypeError;
}

/**
 * Not sent and worth sending later: no network, or no session (it ended while the reading
 * waited; the recorder signs in again). Never a refusal of the reading itself.
 */
const notSentYet = (error: unknown) =>
  isNetworkFailure(error) || (isApiError(error) && error.status === 401);

/** Sends one reading, cutting its sample first when needed; both carry their client ids. */
async function send(entry: QueuedReading): Promise<Reading> {
  if (entry.sampleId === null) {
    const sample = await createSample(entry.lotId, {
      conductorId: entry.conductorId,
      seq: entry.seq,
      clientId: entry.sampleClientId,
    });
    entry.sampleId = sample.id;
  }
  return createReading(entry.sampleId, { ...entry.request, clientId: entry.clientId });
}

const online = () => typeof navigator === 'undefined' || navigator.onLine !== false;

/**
 * Records a bench reading taken by `recorder` (the signed-in user): sent at once when the
 * network answers, else kept on the device, bound to the recorder, and null returned. The
 * recorder's readings already waiting go first, so the order is kept.
 */
export async function recordBenchReading(
  piece: BenchPiece,
  request: ReadingRequest,
  recorder: Recorder,
): Promise<Reading | null> {
  const waiting = (await queuedFor(piece.lotId)).filter((q) => isTakenBy(q, recorder.id));
  const samePiece = waiting.find((q) => q.conductorId === piece.conductorId && q.seq === piece.seq);
  const entry: QueuedReading = {
    clientId: newClientId(),
    lotId: piece.lotId,
    conductorId: piece.conductorId,
    seq: piece.seq,
    sampleId: piece.sampleId ?? samePiece?.sampleId ?? null,
    // A second reading of a piece whose sample is still waiting names the same sample.
    sampleClientId: samePiece?.sampleClientId ?? newClientId(),
    request,
    label: piece.label,
    queuedAt: Date.now(),
    refused: null,
    recordedBy: { id: recorder.id, name: recorder.name },
  };
  if (!online() || waiting.some((q) => q.refused === null)) {
    await enqueue(entry);
    void flushQueue(piece.lotId, recorder.id);
    return null;
  }
  try {
    return await send(entry);
  } catch (error) {
    if (!notSentYet(error)) throw error;
    await enqueue(entry);
    return null;
  }
}

export interface FlushResult {
  sent: number;
  /** Still waiting for the network. */
  waiting: number;
}

/** One flush at a time per lot and recorder; a second call joins the one under way. */
const flushing = new Map<string, Promise<FlushResult>>();

/**
 * Sends the lot's readings taken by `userId` (the signed-in user) in the order they were
 * taken, one at a time; stops at the first network failure or ended session. Readings taken
 * by someone else stay on the device for them: the server would file them under the
 * signed-in user's name. A reading the server refuses stays on the device, marked with the
 * server's reason, and the next ones go on.
 */
export function flushQueue(lotId: number, userId: number): Promise<FlushResult> {
  const key = `${lotId}:${userId}`;
  const running = flushing.get(key);
  if (running) return running;
  const run = (async () => {
    let sent = 0;
    try {
      const entries = (await queuedFor(lotId)).filter(
        (q) => q.refused === null && isTakenBy(q, userId),
      );
      for (const [i, entry] of entries.entries()) {
        try {
          await send(entry);
          await remove(entry.clientId);
          sent += 1;
        } catch (error) {
          if (notSentYet(error)) return { sent, waiting: entries.length - i };
          await update({
            ...entry,
            refused: error instanceof Error ? error.message : String(error),
          });
        }
      }
      return { sent, waiting: 0 };
    } finally {
      flushing.delete(key);
    }
  })();
  flushing.set(key, run);
  return run;
}
