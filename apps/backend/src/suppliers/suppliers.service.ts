import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { SqlEntityManager } from '@mikro-orm/knex';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { likePattern, paging, parseSort, type Page } from '../common/paging';
import { CreateSupplierDto } from './dto/create-supplier.dto';
import { ListSuppliersDto } from './dto/list-suppliers.dto';
import { UpdateSupplierDto } from './dto/update-supplier.dto';
import { Supplier } from './entities/supplier.entity';
import { supplierView, type SupplierView } from './supplier-view';
import { versionedEdit } from '../common/versioned-edit';

const SORTS = ['name', 'code', 'status'] as const;

/** Codes are compared without case: "nbcw" and "NBCW" are one supplier. */
const normalCode = (code: string) => code.trim().toUpperCase();
const blankToNull = (v: string | null | undefined) => (v?.trim() ? v.trim() : null);

@Injectable()
export class SuppliersService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(q: ListSuppliersDto): Promise<Page<SupplierView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, SORTS, ['name', 'asc']);
    // Type only: the same SQL entity manager serves SQLite and PostgreSQL.
    const qb = (this.em as SqlEntityManager).createQueryBuilder(Supplier, 's');
    if (q.status) qb.andWhere({ status: q.status });
    if (q.q?.trim()) {
      const p = likePattern(q.q);
      qb.andWhere(
        `(lower(s.name) like ? escape '\\' or lower(s.code) like ? escape '\\' or lower(coalesce(s.contact_email, '')) like ? escape '\\')`,
        [p, p, p],
      );
    }
    qb.orderBy({ [field]: dir, id: 'asc' })
      .limit(pageSize)
      .offset(offset);
    const [rows, total] = await qb.getResultAndCount();
    return { items: rows.map(supplierView), total, page, pageSize };
  }

  async get(id: number): Promise<SupplierView> {
    return supplierView(await this.em.findOneOrFail(Supplier, { id }));
  }

  async create(dto: CreateSupplierDto, actor: RequestUser): Promise<SupplierView> {
    const code = normalCode(dto.code);
    await this.assertCodeFree(code);
    const supplier = this.em.create(Supplier, {
      name: dto.name.trim(),
      code,
      contactEmail: blankToNull(dto.contactEmail)?.toLowerCase() ?? null,
      status: dto.status ?? 'approved',
      notes: blankToNull(dto.notes),
    });
    await this.em.flush();
    this.audit.record(this.em, actor, {
      action: 'supplier.create',
      entityType: 'supplier',
      entityId: supplier.id,
      after: supplierView(supplier),
    });
    await this.em.flush();
    return supplierView(supplier);
  }

  async update(id: number, dto: UpdateSupplierDto, actor: RequestUser): Promise<SupplierView> {
    return versionedEdit(this.em, {
      version: dto.version,
      load: (em) => em.findOneOrFail(Supplier, { id }),
      view: (_em, supplier) => supplierView(supplier),
      name: (supplier) => `supplier ${supplier.code}`,
      change: async (em, supplier) => {
        const before = supplierView(supplier);
        if (dto.code !== undefined && normalCode(dto.code) !== supplier.code) {
          await this.assertCodeFree(normalCode(dto.code), em);
          supplier.code = normalCode(dto.code);
        }
        if (dto.name !== undefined) supplier.name = dto.name.trim();
        if (dto.contactEmail !== undefined) {
          supplier.contactEmail = blankToNull(dto.contactEmail)?.toLowerCase() ?? null;
        }
        if (dto.status !== undefined) supplier.status = dto.status;
        if (dto.notes !== undefined) supplier.notes = blankToNull(dto.notes);
        await em.flush();
        const after = supplierView(supplier);
        this.audit.record(em, actor, {
          action: before.status !== supplier.status ? 'supplier.status' : 'supplier.update',
          entityType: 'supplier',
          entityId: supplier.id,
          before,
          after,
        });
        await em.flush();
        return after;
      },
    });
  }

  private async assertCodeFree(code: string, em: EntityManager = this.em): Promise<void> {
    if (await em.count(Supplier, { code })) {
      throw DomainError.conflict(
        `Supplier code ${code} is already used by another supplier`,
        'code',
      );
    }
  }
}
