import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { flushQueue } from '@/features/inspection/api/record-bench-reading';
import {
  isTakenBy,
  queuedFor,
  remove,
  update,
  type QueuedReading,
  type Recorder,
} from '@/features/inspection/lib/offline-queue';
import { queryKeys } from '@/lib/query-keys';

/** Try again this often while readings wait and the device says it is online (common practice, no source). */
const RETRY_MS = 10_000;

/**
 * The lot's readings waiting on this device, sent when the network comes back (the
 * browser's `online` event), when the bench opens, every few seconds while some wait, and
 * on "Send now" — only those `user` took: `held` are someone else's, kept for them.
 */
export function useBenchQueue(lotId: number, user: Recorder) {
  const queryClient = useQueryClient();
  const [all, setAll] = useState<QueuedReading[]>([]);
  const [sending, setSending] = useState(false);

  const refresh = useCallback(async () => {
    setAll(await queuedFor(lotId));
  }, [lotId]);

  const send = useCallback(async () => {
    setSending(true);
    try {
      const { sent } = await flushQueue(lotId, user.id);
      if (sent > 0) await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    } finally {
      setSending(false);
      await refresh();
    }
  }, [lotId, user.id, queryClient, refresh]);

  useEffect(() => {
    void send();
    const onOnline = () => void send();
    globalThis.addEventListener('online', onOnline);
    return () => globalThis.removeEventListener('online', onOnline);
  }, [send]);

  const entries = all.filter((e) => isTakenBy(e, user.id));
  const held = all.filter((e) => !isTakenBy(e, user.id));
  const waiting = entries.filter((e) => e.refused === null).length;
  useEffect(() => {
    if (waiting === 0) return undefined;
    const timer = setInterval(() => {
      if (navigator.onLine) void send();
    }, RETRY_MS);
    return () => clearInterval(timer);
  }, [waiting, send]);

  const discard = useCallback(
    async (clientId: string) => {
      await remove(clientId);
      await refresh();
    },
    [refresh],
  );

  /** A reading kept before the device knew who took it: the user says it is theirs, it goes. */
  const claim = useCallback(
    async (clientId: string) => {
      const entry = all.find((e) => e.clientId === clientId && !e.recordedBy);
      if (!entry) return;
      await update({ ...entry, recordedBy: { id: user.id, name: user.name } });
      await send();
    },
    [all, user.id, user.name, send],
  );

  return { entries, held, all, sending, send, refresh, discard, claim };
}
