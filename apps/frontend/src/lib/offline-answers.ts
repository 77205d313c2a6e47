/**
 * The service worker keeps the last answers for the session, a lot and the instrument
 * register so bench mode opens offline (vite.config.ts, runtimeCaching `cacheName`). They
 * belong to whoever was signed in: forgotten on sign-out, on sign-in and when a session
 * ends, or the next person on this device could be shown the previous one's session and
 * lots while offline.
 */
export const OFFLINE_ANSWERS_CACHE = 'gaugeproof-bench-api';

export async function forgetOfflineAnswers(): Promise<void> {
  if (typeof caches === 'undefined') return;
  await caches.delete(OFFLINE_ANSWERS_CACHE).catch(() => false);
}
