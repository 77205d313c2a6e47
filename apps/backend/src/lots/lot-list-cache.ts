import { Injectable } from '@nestjs/common';
import type { JsonAnswer } from '../common/json-answer';
import { CacheProvider, WriteInvalidatedCache } from '../common/write-invalidated-cache';
import { Product } from '../products/entities/product.entity';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { User } from '../users/entities/user.entity';
import { Lot } from './entities/lot.entity';

/**
 * Safety net for writes made outside this process (another server on the same PostgreSQL
 * database): nothing kept here is older than this (common practice, no source). Writes
 * made by this process clear the cache at once.
 */
const MAX_AGE_MS = 30_000;
/** Pages are newer news than totals: another server's lot shows within 5 s (our choice). */
const PAGE_MAX_AGE_MS = 5_000;
/** Distinct filter sets remembered; the oldest is dropped beyond it (common practice, no source). */
const MAX_ENTRIES = 500;
/** Distinct pages remembered (our choice: 200 pages of 50 summaries are about 4 MB). */
const MAX_PAGES = 200;

/**
 * The lot list's totals per filter set and its pages per query, kept until the next write
 * that could change them.
 * - Totals: counting every lot of a status set with a text filter reads tens of thousands
 *   of rows while the page walks an index and stops after 50; they change with lots, and
 *   with the supplier names and SKUs the text filter matches.
 * - Pages, as JSON answers: the screen every clerk, QA lead and buyer opens first, asked with the same few
 *   filter sets all day; a page shows the lot, its product, supplier and receiving clerk,
 *   so a write to any of those clears it.
 * Writes through MikroORM clear them, and so does the reading writer's SQL (announced as a
 * write of `Lot`).
 */
@Injectable()
export class LotListCache extends CacheProvider {
  // The text filter matches supplier names and SKUs, so a rename changes a total too.
  private readonly totals = new WriteInvalidatedCache<number>(
    [Lot, Product, Supplier],
    MAX_AGE_MS,
    MAX_ENTRIES,
  );
  private readonly pages = new WriteInvalidatedCache<JsonAnswer>(
    [Lot, Product, Supplier, User],
    PAGE_MAX_AGE_MS,
    MAX_PAGES,
  );

  protected readonly caches = [this.totals, this.pages];

  total(key: string, count: () => Promise<number>): Promise<number> {
    return this.totals.get(key, count);
  }

  /** A page, kept as its JSON answer (serialised once, see common/json-answer.ts). */
  page(key: string, read: () => Promise<JsonAnswer>): Promise<JsonAnswer> {
    return this.pages.get(key, read);
  }
}
