import { Injectable } from '@nestjs/common';
import { CacheProvider, WriteInvalidatedCache } from '../common/write-invalidated-cache';
import { CorrectiveAction } from '../corrective-actions/entities/corrective-action.entity';
import { Decision } from '../decisions/entities/decision.entity';
import { Reading } from '../inspection/entities/reading.entity';
import { Sample } from '../inspection/entities/sample.entity';
import { Lot } from '../lots/entities/lot.entity';
import { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { Product } from '../products/entities/product.entity';
import { VendorReturn } from '../returns/entities/vendor-return.entity';
import { Supplier } from '../suppliers/entities/supplier.entity';
import type { ScorecardList } from '@gaugeproof/api-types';

/** Writes from outside this process show within this (common practice, no source). */
const MAX_AGE_MS = 60_000;
/** Ranges remembered at once (common practice, no source). */
const MAX_ENTRIES = 50;

/**
 * The ranking of all suppliers per range and day, kept until the next write to anything it
 * is counted from. Its six aggregates read every reading of the range (hundreds of
 * thousands on a distributor's year), while purchasing opens it far more often than the
 * evidence under it changes.
 */
@Injectable()
export class ScorecardCache extends CacheProvider {
  private readonly cache = new WriteInvalidatedCache<ScorecardList>(
    [
      Lot,
      Sample,
      Reading,
      Decision,
      CorrectiveAction,
      VendorReturn,
      Supplier,
      Product,
      ConductorSpec,
    ],
    MAX_AGE_MS,
    MAX_ENTRIES,
  );

  protected readonly caches = [this.cache];

  list(key: string, compute: () => Promise<ScorecardList>): Promise<ScorecardList> {
    return this.cache.get(key, compute);
  }
}
