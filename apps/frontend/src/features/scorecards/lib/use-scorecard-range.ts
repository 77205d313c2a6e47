import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { rangeFromParams } from '@/features/scorecards/lib/date-range';
import type { DateRange } from '@/features/scorecards/types';

/** The scorecard range kept in `?from=&to=`, so a shared link shows the same figures. */
export function useScorecardRange(): [DateRange, (range: DateRange) => void] {
  const [search, setSearch] = useSearchParams();
  const fromParam = search.get('from');
  const toParam = search.get('to');
  const range = useMemo(() => rangeFromParams(fromParam, toParam), [fromParam, toParam]);
  const setRange = useCallback(
    (next: DateRange) =>
      setSearch(
        (prev) => {
          const params = new URLSearchParams(prev);
          params.set('from', next.from);
          params.set('to', next.to);
          return params;
        },
        { replace: true },
      ),
    [setSearch],
  );
  return [range, setRange];
}
