import { Collection, Entity, ManyToOne, OneToMany, Property } from '@mikro-orm/core';
import { Lot } from '../../lots/entities/lot.entity';
import { ConductorSpec } from '../../products/entities/conductor-spec.entity';
import { User } from '../../users/entities/user.entity';
import { Reading } from './reading.entity';
import { CreatedEntity } from '../../common/base-entities';

/** One cut piece from one unit of a lot, for one conductor of the product. */
@Entity({ tableName: 'samples' })
export class Sample extends CreatedEntity {
  @ManyToOne(() => Lot)
  lot!: Lot;

  @ManyToOne(() => ConductorSpec)
  conductor!: ConductorSpec;

  /** Number of this sample within its lot and conductor, from 1. */
  @Property({ type: 'integer' })
  seq!: number;

  /** Which unit it was cut from (spool number, kit serial …). */
  @Property({ type: 'string', length: 64, nullable: true })
  unitRef: string | null = null;

  @OneToMany(() => Reading, (r) => r.sample)
  readings = new Collection<Reading>(this);

  @ManyToOne(() => User)
  createdBy!: User;
}
