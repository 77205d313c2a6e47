/**
 * Column values of plain SQL rows, which differ by driver: SQLite gives instants as epoch
 * milliseconds and JSON as text; PostgreSQL through MikroORM gives instants as text (or
 * Date) and JSON parsed.
 */
export function instantOf(v: unknown): Date {
  if (v instanceof Date) return v;
  if (typeof v === 'number' || /^\d+$/.test(String(v))) return new Date(Number(v));
  return new Date(String(v));
}

export function jsonOf<T>(v: unknown): T {
  return (typeof v === 'string' ? JSON.parse(v) : v) as T;
}
