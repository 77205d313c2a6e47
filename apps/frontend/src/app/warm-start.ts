import type { QueryClient } from '@tanstack/react-query';
import { matchPath } from 'react-router';
import { paths } from '@/config/paths';
import { instrumentsQueryOptions } from '@/features/inspection/api/get-instruments';
import { lotQueryOptions } from '@/lib/lots-api';

/** The Lot page's code: one loader, so the router and the warm start fetch one chunk. */
export const loadLotRoute = () => import('@/app/routes/lot');

/**
 * Work a screen opened directly (a link, a tag's QR code, a reload) needs, started beside
 * the session check instead of after it. The Lot page waited for four round trips in turn:
 * the session, its code, the lot, then the instrument register its sections render with
 * (measured in Chromium on the 50 000-lot bench set: the lot was asked for only once the
 * session and the code were in). Nothing is shown from these answers before the session
 * check passes; without a session the lot answers 401, which ends the session as any 401 does.
 */
export function warmStart(client: QueryClient, pathname: string): void {
  const lot = matchPath(paths.lot.path, pathname);
  const id = Number(lot?.params.id);
  if (!lot || !Number.isInteger(id) || id <= 0) return;
  void loadLotRoute();
  void client.prefetchQuery(lotQueryOptions(id));
  void client.prefetchQuery(instrumentsQueryOptions({ active: true }));
}
