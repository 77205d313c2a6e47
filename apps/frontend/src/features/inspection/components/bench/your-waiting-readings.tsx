import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import { Alert, Link, Typography } from '@mui/material';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { Link as RouterLink, useLocation } from 'react-router';
import { paths } from '@/config/paths';
import { flushQueue } from '@/features/inspection/api/record-bench-reading';
import { allQueued, isTakenBy, type QueuedReading } from '@/features/inspection/lib/offline-queue';
import { queryKeys } from '@/lib/query-keys';
import { toasts } from '@/lib/toast-store';

const plural = (n: number) => `${n} reading${n === 1 ? '' : 's'}`;

/**
 * On every screen after sign-in: the readings this user took on this device that are still
 * waiting (taken offline, possibly while someone else signed in afterwards). They are sent
 * at once under this user's name, the one who took them; what cannot go yet is listed with
 * a link to its lot's bench. Loaded apart from the first screen's code (app shell, lazy).
 */
export default function YourWaitingReadings({ user }: { user: { id: number } | null }) {
  const queryClient = useQueryClient();
  const { pathname } = useLocation();
  const [mine, setMine] = useState<QueuedReading[]>([]);
  const userId = user?.id ?? null;

  const sendMine = useCallback(async () => {
    if (userId === null) return;
    const waiting = (await allQueued()).filter((e) => isTakenBy(e, userId));
    let sent = 0;
    for (const lotId of new Set(waiting.filter((e) => e.refused === null).map((e) => e.lotId))) {
      sent += (await flushQueue(lotId, userId)).sent;
    }
    if (sent > 0) {
      toasts.success(`${plural(sent)} you took while offline ${sent === 1 ? 'was' : 'were'} sent.`);
      await queryClient.invalidateQueries({ queryKey: queryKeys.lots.all });
    }
    setMine((await allQueued()).filter((e) => isTakenBy(e, userId)));
  }, [userId, queryClient]);

  useEffect(() => {
    void sendMine();
    const onOnline = () => void sendMine();
    globalThis.addEventListener('online', onOnline);
    return () => globalThis.removeEventListener('online', onOnline);
  }, [sendMine]);

  // The bench of a lot lists its own waiting readings; this notice names the other lots.
  const benchLot = /^\/lots\/(\d+)\/bench$/.exec(pathname)?.[1];
  const shown = mine.filter((e) => String(e.lotId) !== benchLot);
  if (userId === null || shown.length === 0) return null;
  const lots = [...new Set(shown.map((e) => e.lotId))];
  return (
    <Alert
      severity="info"
      icon={<CloudUploadOutlined />}
      aria-label="Your readings waiting to send"
      sx={{ mb: 2 }}
    >
      <Typography sx={{ fontWeight: 700 }}>
        {plural(shown.length)} you took on this device {shown.length === 1 ? 'is' : 'are'} waiting
        to send
      </Typography>
      <Typography variant="body2">
        They go under your name when the network answers.{' '}
        {lots.map((lotId, i) => (
          <span key={lotId}>
            {i > 0 ? ' · ' : ''}
            <Link component={RouterLink} to={paths.lotBench.getHref(lotId)}>
              Lot {lotId} in bench mode ({shown.filter((e) => e.lotId === lotId).length})
            </Link>
          </span>
        ))}
      </Typography>
    </Alert>
  );
}
