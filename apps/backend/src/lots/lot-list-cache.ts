import { Injectable } from '@nestjs/common';
import type { JsonAnswer } from '../common/json-answer';
import { CountedCache } from '../common/counted-cache';
import type { Counters } from '../common/change-counters';

/** Distinct filter sets remembered; the oldest is dropped beyond it (common practice, no source). */
const MAX_ENTRIES = 500;
/** Distinct pages remembered (our choice: 200 pages of 50 summaries are about 4 MB). */
const MAX_PAGES = 200;

/**
 * The lot list's totals per filter set and its pages per query, kept while the tables they
 * are read from are unwritten (common/counted-cache.ts), on every server alike.
 * - Totals: counting every lot of a status set with a text filter reads tens of thousands
 *   of rows while the page walks an index and stops after 50; the text filter matches
 *   supplier names and SKUs too.
 * - Pages, as JSON answers: the screen every clerk, QA lead and buyer opens first, asked
 *   with the same few filter sets all day; a row shows the lot, its product, supplier and
 *   receiving clerk.
 */
@Injectable()
export class LotListCache {
  private readonly totals = new CountedCache<number>(
    ['lots', 'products', 'suppliers'],
    MAX_ENTRIES,
  );
  private readonly pages = new CountedCache<JsonAnswer>(
    ['lots', 'products', 'suppliers', 'users'],
    MAX_PAGES,
  );

  total(counters: Counters, key: string, count: () => Promise<number>): Promise<number> {
    return this.totals.get(counters, key, count);
  }

  /** A page, kept as its JSON answer (serialised once, see common/json-answer.ts). */
  page(counters: Counters, key: string, read: () => Promise<JsonAnswer>): Promise<JsonAnswer> {
    return this.pages.get(counters, key, read);
  }
}
