import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { flushQueue } from '@/features/inspection/api/record-bench-reading';
import { queuedFor, remove, type QueuedReading } from '@/features/inspection/lib/offline-queue';
import { queryKeys } from '@/lib/query-keys';

/** Try again this often while readings wait and the device says it is online (common practice, no source). */
const RETRY_MS = 10_000;

/**
 * The lot's readings waiting on this device, sent when the network comes back (the
 * browser's `online` event), when the bench opens, every few seconds while some wait, and
 * on "Send now".
 */
export function useBenchQueue(lotId: number) {
  const queryClient = useQueryClient();
  const [entries, setEntries] = useState<QueuedReading[]>([]);
  const [sending, setSending] = useState(false);

  const refresh = useCallback(async () => {
    setEntries(await queuedFor(lotId));
  }, [lotId]);

  const send = useCallback(async () => {
    setSending(true);
    try {
      const { sent } = await flushQueue(lotId);
      if (sent > 0) await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    } finally {
      setSending(false);
      await refresh();
    }
  }, [lotId, queryClient, refresh]);

  useEffect(() => {
    void send();
    const onOnline = () => void send();
    globalThis.addEventListener('online', onOnline);
    return () => globalThis.removeEventListener('online', onOnline);
  }, [send]);

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

  return { entries, sending, send, refresh, discard };
}
