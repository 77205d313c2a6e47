import { Injectable } from '@nestjs/common';
import type { ScorecardList } from '@gaugeproof/api-types';
import { CountedCache } from '../common/counted-cache';
import type { Counters } from '../common/change-counters';

/** Ranges remembered at once (common practice, no source). */
const MAX_ENTRIES = 50;

/**
 * The ranking of all suppliers per range and day, kept while nothing it is counted from is
 * written (common/counted-cache.ts), on every server alike. Its six aggregates read every
 * reading of the range (hundreds of thousands on a distributor's year), while purchasing
 * opens it far more often than the evidence under it changes.
 */
@Injectable()
export class ScorecardCache {
  private readonly cache = new CountedCache<ScorecardList>(
    [
      'conductor_specs',
      'corrective_actions',
      'lots',
      'readings',
      'samples',
      'suppliers',
      'vendor_returns',
    ],
    MAX_ENTRIES,
  );

  list(
    counters: Counters,
    key: string,
    compute: () => Promise<ScorecardList>,
  ): Promise<ScorecardList> {
    return this.cache.get(counters, key, compute);
  }
}
