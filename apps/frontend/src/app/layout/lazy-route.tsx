import { lazy, Suspense, type ComponentType, type ReactNode } from 'react';
import Box from '@mui/material/Box';
import LinearProgress from '@mui/material/LinearProgress';

/**
 * A route component loaded on first visit, so the first screen downloads only its own
 * code: `lazyRoute(() => import('@/app/routes/lots'), 'LotsRoute')`.
 */
export function lazyRoute<K extends string>(
  load: () => Promise<Record<K, ComponentType>>,
  name: K,
): ComponentType {
  const component = lazy<ComponentType>(async () => ({ default: (await load())[name] }));
  return component as ComponentType;
}

/** While a screen's code downloads: a thin bar where the screen will be. */
export function RouteFallback() {
  return (
    <Box role="progressbar" aria-label="Loading screen" sx={{ py: 1 }}>
      <LinearProgress />
    </Box>
  );
}

export function WithRouteFallback({ children }: { children: ReactNode }) {
  return <Suspense fallback={<RouteFallback />}>{children}</Suspense>;
}
