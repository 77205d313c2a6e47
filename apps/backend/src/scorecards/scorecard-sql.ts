import type { Platform } from '@mikro-orm/core';
import { PostgreSqlPlatform } from '@mikro-orm/postgresql';
import { AWG_SIZES, METRIC_SIZES } from '@gaugeproof/standards';
import type { MonthBucket } from './scorecard-range';

/** A piece of SQL with its `?` bindings, to pass to knex.raw. */
export interface SqlPart {
  sql: string;
  bindings: unknown[];
}

/** A Date as the platform stores it (SQLite: epoch milliseconds; PostgreSQL: timestamp). */
export function dateParam(platform: Platform, date: Date): unknown {
  return platform.processDateProperty(date);
}

/**
 * The month bucket of a datetime column as a 0-based index into `months`, computed with a
 * portable CASE over boundaries worked out in JS (no date functions of any one database).
 * Rows must already be limited to the range.
 */
export function monthIndex(platform: Platform, column: string, months: MonthBucket[]): SqlPart {
  if (months.length <= 1) return { sql: '0', bindings: [] };
  const whens = months.slice(0, -1).map((_, i) => `WHEN ${column} < ? THEN ${i}`);
  return {
    sql: `CASE ${whens.join(' ')} ELSE ${months.length - 1} END`,
    bindings: months.slice(0, -1).map((m) => dateParam(platform, m.end)),
  };
}

/**
 * Rank of a size label, larger = thicker: AWG ranks are −n of ASTM B258's gauge number
 * (4/0 = 3 … 40 AWG = −40), metric ranks the IEC 60228 series position (0.5 mm² = 0 …).
 * Unknown labels give NULL, which MAX ignores.
 */
function sizeRank(column: string, system: 'awg' | 'metric'): SqlPart {
  const sizes =
    system === 'awg'
      ? AWG_SIZES.map((g) => ({ label: g.label, rank: -(g.awg ?? 0) }))
      : METRIC_SIZES.map((g, i) => ({ label: g.label, rank: i }));
  // Ranks are our own integers, written as literals: a bound THEN value would be typed
  // text by PostgreSQL and the difference of two would fail.
  return {
    sql: `CASE ${column} ${sizes.map((s) => `WHEN ? THEN ${Math.trunc(s.rank)}`).join(' ')} ELSE NULL END`,
    bindings: sizes.map((s) => s.label),
  };
}

/**
 * Standard sizes between the conductor's label and what a reading measured as: label
 * 4 AWG measuring as 8 AWG is 4 sizes short (positive = smaller than the label). The
 * two labels are compared within the conductor's own system, from the standards
 * library's gauge lists; a measured label of another system gives NULL.
 */
export function sizesShort(
  labelColumn: string,
  measuredColumn: string,
  systemColumn: string,
): SqlPart {
  const parts = (system: 'awg' | 'metric') => {
    const label = sizeRank(labelColumn, system);
    const measured = sizeRank(measuredColumn, system);
    return {
      sql: `(${label.sql}) - (${measured.sql})`,
      bindings: [...label.bindings, ...measured.bindings],
    };
  };
  const awg = parts('awg');
  const metric = parts('metric');
  return {
    sql: `CASE WHEN ${systemColumn} = ? THEN ${awg.sql} ELSE ${metric.sql} END`,
    bindings: ['awg', ...awg.bindings, ...metric.bindings],
  };
}

/**
 * Milliseconds from one datetime column to another. SQLite stores MikroORM datetimes as
 * epoch milliseconds, so a plain difference; PostgreSQL subtracts timestamps to an
 * interval, read as seconds with EXTRACT(EPOCH …). The only platform switch here.
 */
export function millisBetween(platform: Platform, fromColumn: string, toColumn: string): string {
  if (platform instanceof PostgreSqlPlatform) {
    return `(EXTRACT(EPOCH FROM (${toColumn} - ${fromColumn})) * 1000)`;
  }
  return `(${toColumn} - ${fromColumn})`;
}

/** Aggregates come back as strings on PostgreSQL (bigint, numeric) and numbers on SQLite. */
export function num(value: unknown): number {
  return value === null || value === undefined ? 0 : Number(value);
}

export function numOrNull(value: unknown): number | null {
  return value === null || value === undefined ? null : Number(value);
}
