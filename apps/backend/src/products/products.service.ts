import { DomainError } from '../common/domain-error';
import { ForbiddenException, Injectable } from '@nestjs/common';
import type { Role } from '../auth/roles';
import { EntityManager } from '@mikro-orm/core';
import type { SqlEntityManager } from '@mikro-orm/knex';
import { initialInspectionState } from '@gaugeproof/standards';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { likePattern, paging, parseSort, type Page } from '../common/paging';
import { Supplier } from '../suppliers/entities/supplier.entity';
import { parseConductors, replaceConductors } from './conductor-specs';
import { CreateProductDto } from './dto/create-product.dto';
import { ListProductsDto } from './dto/list-products.dto';
import { UpdateProductDto } from './dto/update-product.dto';
import { InspectionState } from './entities/inspection-state.entity';
import { Product } from './entities/product.entity';
import { productView, type ProductView } from './product-view';
import { planForLot, type PlanAnswer } from './sampling-plan';
import { versionedEdit } from '../common/versioned-edit';
import { clock } from '../common/clock';

const SORTS = ['sku', 'description', 'kind', 'supplier', 'createdAt'] as const;
const SORT_COLUMNS: Record<(typeof SORTS)[number], string> = {
  sku: 'p.sku',
  description: 'p.description',
  kind: 'p.kind',
  supplier: 's.name',
  createdAt: 'p.createdAt',
};

/**
 * Who may set what a lot is judged against: purchasing may add products (with the default
 * criteria) and edit their description, unit length and active flag, but loosening the
 * criteria would let a supplier's short copper pass (issue 17 item 6).
 */
const CRITERIA_ROLES: readonly Role[] = ['qa_lead', 'admin'];
/** Defaults of a new product: S-3 and AQL 1.0 (our choice), 0.98 area ratio (ASTM B496). */
const DEFAULT_CRITERIA = {
  inspectionLevel: 'S-3',
  aql: '1.0',
  minAreaRatio: 0.98,
  concessionNeedsApproval: true,
} as const;

/** The parts of a product view a lot is judged against. */
function acceptanceCriteria(v: ProductView) {
  return {
    inspectionLevel: v.inspectionLevel,
    aql: v.aql,
    minAreaRatio: v.minAreaRatio,
    concessionNeedsApproval: v.concessionNeedsApproval,
    conductors: v.conductors.map((c) => ({
      position: c.position,
      purpose: c.purpose,
      gauge: c.gauge,
      nominalAreaMm2: c.nominalAreaMm2,
      claimedMaterial: c.claimedMaterial,
      claimedStrands: c.claimedStrands,
    })),
  };
}

@Injectable()
export class ProductsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async list(q: ListProductsDto): Promise<Page<ProductView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, SORTS, ['sku', 'asc']);
    const qb = (this.em as SqlEntityManager)
      .createQueryBuilder(Product, 'p')
      .select('p.*')
      .join('p.supplier', 's');
    if (q.supplierId) qb.andWhere({ supplier: q.supplierId });
    if (q.kind) qb.andWhere({ kind: q.kind });
    if (q.active !== undefined) qb.andWhere({ active: q.active });
    if (q.q?.trim()) {
      const p = likePattern(q.q);
      qb.andWhere(
        `(lower(p.sku) like ? escape '\\' or lower(p.description) like ? escape '\\' or lower(s.name) like ? escape '\\')`,
        [p, p, p],
      );
    }
    const total = await qb.clone().getCount('p.id');
    const rows = await qb
      .orderBy({ [SORT_COLUMNS[field]]: dir, 'p.id': 'asc' })
      .limit(pageSize)
      .offset(offset)
      .getResultList();
    await this.em.populate(rows, ['supplier', 'conductors']);
    const states = await this.statesOf(rows);
    return {
      items: rows.map((p) => productView(p, states.get(p.id) ?? null)),
      total,
      page,
      pageSize,
    };
  }

  async get(id: number): Promise<ProductView> {
    const product = await this.load(id);
    return productView(product, await this.stateOf(product));
  }

  async samplingPlan(id: number, quantity: number): Promise<PlanAnswer> {
    const product = await this.load(id);
    return planForLot(product, await this.stateOf(product), quantity);
  }

  async create(dto: CreateProductDto, actor: RequestUser): Promise<ProductView> {
    const conductors = parseConductors(dto.conductors);
    const supplier = await this.em.findOne(Supplier, { id: dto.supplierId });
    if (!supplier)
      throw DomainError.invalid([
        { field: 'supplierId', message: 'supplierId must be the id of a supplier' },
      ]);
    const sku = dto.sku.trim();
    if (await this.em.count(Product, { supplier, sku })) {
      throw DomainError.conflict(`${supplier.name} already has a product with SKU ${sku}`, 'sku');
    }
    if (!CRITERIA_ROLES.includes(actor.role)) {
      const off = (
        [
          ['inspectionLevel', dto.inspectionLevel, DEFAULT_CRITERIA.inspectionLevel],
          ['aql', dto.aql, DEFAULT_CRITERIA.aql],
          ['minAreaRatio', dto.minAreaRatio, DEFAULT_CRITERIA.minAreaRatio],
          [
            'concessionNeedsApproval',
            dto.concessionNeedsApproval,
            DEFAULT_CRITERIA.concessionNeedsApproval,
          ],
        ] as const
      ).filter(([, given, usual]) => given !== undefined && given !== usual);
      if (off.length) {
        throw new ForbiddenException(
          `Only a QA lead or an admin can set acceptance criteria other than the defaults (${off.map(([k]) => k).join(', ')}); nothing was saved.`,
        );
      }
    }
    return this.em.transactional(async (em) => {
      const product = em.create(Product, {
        supplier,
        sku,
        kind: dto.kind,
        description: dto.description.trim(),
        lengthPerUnitM: dto.lengthPerUnitM ?? null,
        inspectionLevel: dto.inspectionLevel ?? DEFAULT_CRITERIA.inspectionLevel,
        aql: dto.aql ?? DEFAULT_CRITERIA.aql,
        minAreaRatio: dto.minAreaRatio ?? DEFAULT_CRITERIA.minAreaRatio,
        concessionNeedsApproval:
          dto.concessionNeedsApproval ?? DEFAULT_CRITERIA.concessionNeedsApproval,
      });
      replaceConductors(em, product, conductors);
      // Every supplier-product stream starts on normal inspection (ISO 2859-1).
      const state = em.create(InspectionState, {
        product,
        severity: 'normal',
        state: { ...initialInspectionState() },
      });
      await em.flush();
      const view = productView(product, state);
      this.audit.record(em, actor, {
        action: 'product.create',
        entityType: 'product',
        entityId: product.id,
        after: view,
      });
      return view;
    });
  }

  async update(id: number, dto: UpdateProductDto, actor: RequestUser): Promise<ProductView> {
    const conductors = dto.conductors ? parseConductors(dto.conductors) : null;
    return versionedEdit(this.em, {
      version: dto.version,
      load: (em) => em.findOneOrFail(Product, { id }, { populate: ['supplier', 'conductors'] }),
      view: async (em, product) =>
        productView(product, await em.findOne(InspectionState, { product })),
      name: (product) => `product ${product.sku}`,
      change: async (em, product) => {
        const state = await em.findOne(InspectionState, { product });
        const before = productView(product, state);
        if (dto.description !== undefined) product.description = dto.description.trim();
        if (dto.lengthPerUnitM !== undefined) product.lengthPerUnitM = dto.lengthPerUnitM;
        if (dto.inspectionLevel !== undefined) product.inspectionLevel = dto.inspectionLevel;
        if (dto.aql !== undefined) product.aql = dto.aql;
        if (dto.minAreaRatio !== undefined) product.minAreaRatio = dto.minAreaRatio;
        if (dto.concessionNeedsApproval !== undefined)
          product.concessionNeedsApproval = dto.concessionNeedsApproval;
        if (dto.active !== undefined) product.active = dto.active;
        if (conductors) {
          replaceConductors(em, product, conductors);
          // The product row is written too, so its version moves with its conductors.
          product.updatedAt = clock.now();
        }
        const criteriaBefore = acceptanceCriteria(before);
        const criteriaAfter = acceptanceCriteria(productView(product, state));
        const criteriaChanged = JSON.stringify(criteriaBefore) !== JSON.stringify(criteriaAfter);
        if (criteriaChanged && !CRITERIA_ROLES.includes(actor.role)) {
          // Nothing is flushed: the transaction ends with the refusal.
          throw new ForbiddenException(
            'Only a QA lead or an admin can change acceptance criteria (inspection level, AQL, minimum area ratio, conductor specs); nothing was saved.',
          );
        }
        await em.flush();
        const after = productView(product, state);
        if (criteriaChanged) {
          this.audit.record(em, actor, {
            action: 'product.criteria',
            entityType: 'product',
            entityId: product.id,
            before: criteriaBefore,
            after: criteriaAfter,
          });
        }
        this.audit.record(em, actor, {
          action: 'product.update',
          entityType: 'product',
          entityId: product.id,
          before,
          after,
        });
        return after;
      },
    });
  }

  private load(id: number): Promise<Product> {
    return this.em.findOneOrFail(Product, { id }, { populate: ['supplier', 'conductors'] });
  }

  private stateOf(product: Product): Promise<InspectionState | null> {
    return this.em.findOne(InspectionState, { product });
  }

  private async statesOf(products: Product[]): Promise<Map<number, InspectionState>> {
    if (!products.length) return new Map();
    const states = await this.em.find(InspectionState, { product: { $in: products } });
    return new Map(states.map((s) => [s.product.id, s]));
  }
}
