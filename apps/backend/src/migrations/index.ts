import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201225022 } from './postgresql/Migration20261201225022';
import { Migration20261202001640 } from './postgresql/Migration20261202001640';
import { Migration20261202004244 } from './postgresql/Migration20261202004244';
import { Migration20261203101920 } from './postgresql/Migration20261203101920';
import { Migration20261203105417 } from './postgresql/Migration20261203105417';
import { Migration20261203113010 } from './postgresql/Migration20261203113010';
import { Migration20261203114950 } from './postgresql/Migration20261203114950';
import { Migration20261203120010 } from './postgresql/Migration20261203120010';
import { Migration20261201224334 } from './sqlite/Migration20261201224334';
import { Migration20261202001630 } from './sqlite/Migration20261202001630';
import { Migration20261202004800 } from './sqlite/Migration20261202004800';
import { Migration20261203101930 } from './sqlite/Migration20261203101930';
import { Migration20261203105427 } from './sqlite/Migration20261203105427';
import { Migration20261203113000 } from './sqlite/Migration20261203113000';
import { Migration20261203114510 } from './postgresql/Migration20261203114510';
import { Migration20261203114500 } from './sqlite/Migration20261203114500';
import { Migration20261203115000 } from './sqlite/Migration20261203115000';
import { Migration20261203120000 } from './sqlite/Migration20261203120000';
import { Migration20261203120504 } from './postgresql/Migration20261203120504';
import { Migration20261203133643 } from './postgresql/Migration20261203133643';
import { Migration20261203143251 } from './postgresql/Migration20261203143251';
import { Migration20261203120500 } from './sqlite/Migration20261203120500';
import { Migration20261203133640 } from './sqlite/Migration20261203133640';
import { Migration20261203143250 } from './sqlite/Migration20261203143250';
import { Migration20261203152700 } from './sqlite/Migration20261203152700';
import { Migration20261203152710 } from './postgresql/Migration20261203152710';
import { Migration20261203153113 } from './postgresql/Migration20261203153113';
import { Migration20261203153110 } from './sqlite/Migration20261203153110';
import { Migration20261203180000 } from './sqlite/Migration20261203180000';
import { Migration20261203180005 } from './postgresql/Migration20261203180005';
import { Migration20261203181500 } from './sqlite/Migration20261203181500';
import { Migration20261203181510 } from './postgresql/Migration20261203181510';
import { Migration20261203182000 } from './sqlite/Migration20261203182000';
import { Migration20261203182010 } from './postgresql/Migration20261203182010';

/**
 * Migrations per driver, in order, each driver in its own folder; listed in code so the
 * built server needs no globbing. `test/migrations.e2e-spec.ts` checks that each set
 * builds exactly the schema the entities describe.
 */
export const SQLITE_MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201224334', class: Migration20261201224334 },
  { name: 'Migration20261202001630', class: Migration20261202001630 },
  { name: 'Migration20261202004800', class: Migration20261202004800 },
  { name: 'Migration20261203101930', class: Migration20261203101930 },
  { name: 'Migration20261203105427', class: Migration20261203105427 },
  { name: 'Migration20261203113000', class: Migration20261203113000 },
  { name: 'Migration20261203114500', class: Migration20261203114500 },
  { name: 'Migration20261203115000', class: Migration20261203115000 },
  { name: 'Migration20261203120000', class: Migration20261203120000 },
  { name: 'Migration20261203120500', class: Migration20261203120500 },
  { name: 'Migration20261203133640', class: Migration20261203133640 },
  { name: 'Migration20261203143250', class: Migration20261203143250 },
  { name: 'Migration20261203152700', class: Migration20261203152700 },
  { name: 'Migration20261203153110', class: Migration20261203153110 },
  { name: 'Migration20261203180000', class: Migration20261203180000 },
  { name: 'Migration20261203181500', class: Migration20261203181500 },
  { name: 'Migration20261203182000', class: Migration20261203182000 },
];

export const POSTGRES_MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201225022', class: Migration20261201225022 },
  { name: 'Migration20261202001640', class: Migration20261202001640 },
  { name: 'Migration20261202004244', class: Migration20261202004244 },
  { name: 'Migration20261203101920', class: Migration20261203101920 },
  { name: 'Migration20261203105417', class: Migration20261203105417 },
  { name: 'Migration20261203113010', class: Migration20261203113010 },
  { name: 'Migration20261203114510', class: Migration20261203114510 },
  { name: 'Migration20261203114950', class: Migration20261203114950 },
  { name: 'Migration20261203120010', class: Migration20261203120010 },
  { name: 'Migration20261203120504', class: Migration20261203120504 },
  { name: 'Migration20261203133643', class: Migration20261203133643 },
  { name: 'Migration20261203143251', class: Migration20261203143251 },
  { name: 'Migration20261203152710', class: Migration20261203152710 },
  { name: 'Migration20261203153113', class: Migration20261203153113 },
  { name: 'Migration20261203180005', class: Migration20261203180005 },
  { name: 'Migration20261203181510', class: Migration20261203181510 },
  { name: 'Migration20261203182010', class: Migration20261203182010 },
];
