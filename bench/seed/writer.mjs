// Prepared INSERTs per table with explicit ids, so rows can reference each other without
// reading anything back; counts rows for the rows-per-second line.
export class Writer {
  constructor(db) {
    this.db = db;
    this.statements = new Map();
    this.counts = new Map();
    this.ids = new Map();
  }

  /** The next id of a table (ids are assigned here, from 1). */
  nextId(table) {
    const id = (this.ids.get(table) ?? 0) + 1;
    this.ids.set(table, id);
    return id;
  }

  insert(table, row) {
    const columns = Object.keys(row);
    const key = `${table}(${columns.join(',')})`;
    let stmt = this.statements.get(key);
    if (!stmt) {
      const cols = columns.map((c) => `"${c}"`).join(', ');
      const params = columns.map((c) => `@${c}`).join(', ');
      stmt = this.db.prepare(`insert into "${table}" (${cols}) values (${params})`);
      this.statements.set(key, stmt);
    }
    const values = {};
    for (const c of columns) {
      const v = row[c];
      values[c] =
        typeof v === 'boolean'
          ? Number(v)
          : v !== null && typeof v === 'object'
            ? JSON.stringify(v)
            : v;
    }
    stmt.run(values);
    this.counts.set(table, (this.counts.get(table) ?? 0) + 1);
  }

  total() {
    let n = 0;
    for (const c of this.counts.values()) n += c;
    return n;
  }
}
