import { DomainError, type FieldError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { addDays, isCalendarDate } from '../common/calendar';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { csvHeader, csvLines } from './readings-csv';
import {
  EXPORT_PAGE_SIZE,
  ReadingsExportQuery,
  type ExportRange,
  type ExportScope,
} from './readings-export.query';

export interface ReadingsExport {
  filename: string;
  /** CSV text in chunks: the header, then one chunk per page of readings. */
  chunks: AsyncGenerator<string>;
}

function rangeOf(from?: string, to?: string): ExportRange {
  const errors: FieldError[] = [];
  if (from !== undefined && !isCalendarDate(from)) {
    errors.push({ field: 'from', message: 'from must be a real calendar date' });
  }
  if (to !== undefined && !isCalendarDate(to)) {
    errors.push({ field: 'to', message: 'to must be a real calendar date' });
  }
  if (errors.length) throw DomainError.invalid(errors);
  if (from && to && from > to)
    throw DomainError.invalid([{ field: 'from', message: 'from must be on or before to' }]);
  return {
    start: from ? new Date(`${from}T00:00:00.000Z`) : null,
    end: to ? new Date(`${addDays(to, 1)}T00:00:00.000Z`) : null,
  };
}

/** Every reading of a supplier's lots, voided ones included, lot by lot, streamed in pages. */
@Injectable()
export class ReadingsExportService {
  constructor(
    private readonly em: EntityManager,
    private readonly query: ReadingsExportQuery,
    private readonly audit: AuditService,
  ) {}

  /**
   * Checks the request and records the export in the audit trail before the first byte
   * goes out (an export that starts is always on record), then hands back the chunks.
   */
  async start(
    supplierId: number,
    from: string | undefined,
    to: string | undefined,
    actor: RequestUser,
  ): Promise<ReadingsExport> {
    const range = rangeOf(from, to);
    const supplier = await this.em.findOne(
      Supplier,
      { id: supplierId },
      { fields: ['id', 'code'] },
    );
    if (!supplier) throw DomainError.notFound(`Supplier ${supplierId} not found`);
    this.audit.record(this.em, actor, {
      action: 'export.readings',
      entityType: 'supplier',
      entityId: supplier.id,
      after: { format: 'csv', from: from ?? null, to: to ?? null },
    });
    await this.em.flush();
    const span = `${from ?? 'start'}_${to ?? 'latest'}`;
    return {
      filename: `readings-${supplier.code}-${span}.csv`.replace(/[^\w.-]/g, '_'),
      chunks: this.chunks({ supplierId: supplier.id, range }),
    };
  }

  /** The CSV of a scope: header, then one chunk per page of readings. */
  async *chunks(scope: ExportScope): AsyncGenerator<string> {
    yield csvHeader();
    let after = { lotId: 0, readingId: 0 };
    for (;;) {
      const page = await this.query.page(scope, after);
      if (page.length === 0) return;
      yield csvLines(page);
      // A short page is the last: no query for an empty one.
      if (page.length < EXPORT_PAGE_SIZE) return;
      const last = page[page.length - 1];
      after = { lotId: last.lotId, readingId: last.id };
    }
  }
}
