import { PrimaryKey, Property, type MetadataStorage, type Opt } from '@mikro-orm/core';
import { clock } from './clock';

/**
 * What most entities have, written once: an integer id, and where a table has them its
 * created and updated times, read from the clock (`common/clock.ts`). These are mapped
 * superclasses (no table of their own): every entity's columns are what they were.
 */
export abstract class IdEntity {
  @PrimaryKey({ type: 'integer' })
  id!: number;
}

export abstract class CreatedEntity extends IdEntity {
  @Property({ type: 'Date' })
  createdAt: Opt<Date> = clock.now();
}

export abstract class TimestampedEntity extends CreatedEntity {
  @Property({ type: 'Date', onUpdate: () => clock.now() })
  updatedAt: Opt<Date> = clock.now();
}

interface Placement {
  /** Inherited columns that stand before the entity's own (after the id). */
  leading?: readonly string[];
  /** The entity's own column that its later migrations added after the inherited ones. */
  before?: string;
}
const PLACEMENTS = new WeakMap<object, Placement>();

/**
 * Where inherited columns stand in the table. By default after the entity's own columns
 * (as `created_at`/`updated_at` were written last); `before` names the first own column a
 * later migration added after them; a base class names its `leading` columns.
 */
export function InheritedColumns(placement: Placement): ClassDecorator {
  return (target) => {
    PLACEMENTS.set(target, placement);
  };
}

function placementOf(cls: object | null): Placement {
  const found: Placement = {};
  for (let c = cls; c && c !== Function.prototype; c = Object.getPrototypeOf(c) as object) {
    const p = PLACEMENTS.get(c);
    found.leading ??= p?.leading;
    found.before ??= p?.before;
  }
  return found;
}

/**
 * MikroORM's `discovery.afterDiscovered`: MikroORM puts a superclass's columns first; this
 * puts them where each table has them, so the schema the entities describe is column for
 * column the one the migrations built (SQLite's stored schema keeps column order, and
 * test/migrations.e2e-spec.ts compares it). Inherited properties are the ones MikroORM
 * numbered below 1 (its own are numbered from 1 in declaration order).
 */
export function placeInheritedColumns(storage: MetadataStorage): void {
  for (const meta of Object.values(storage.getAll())) {
    const props = Object.values(meta.properties).sort(
      (a, b) => meta.propertyOrder.get(a.name)! - meta.propertyOrder.get(b.name)!,
    );
    const inherited = props.filter((p) => meta.propertyOrder.get(p.name)! < 1 && !p.primary);
    if (!inherited.length) continue;
    const { leading = [], before } = placementOf(meta.class);
    const own = props.filter((p) => !p.primary && !inherited.includes(p));
    const cut = before ? own.findIndex((p) => p.name === before) : -1;
    const at = cut < 0 ? own.length : cut;
    const order = [
      ...props.filter((p) => p.primary),
      ...inherited.filter((p) => leading.includes(p.name)),
      ...own.slice(0, at),
      ...inherited.filter((p) => !leading.includes(p.name)),
      ...own.slice(at),
    ];
    order.forEach((p, i) => meta.propertyOrder.set(p.name, i + 1));
    meta.sync();
  }
}
