import { existsSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase, copyFolder, restoreDatabase } from '../src/ops/sqlite-backup';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

function query<T>(file: string, sql: string): T[] {
  const db = new Database(file, { readonly: true });
  try {
    return db.prepare(sql).all() as T[];
  } finally {
    db.close();
  }
}

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('backup and restore', () => {
  it('copies the live database under write load, and restores it identically', async () => {
    const admin = await t.token(DEMO.admin);
    mkdirSync(t.config.uploadDir, { recursive: true });
    writeFileSync(join(t.config.uploadDir, 'photo-1.png'), 'not really a png');
    const confirmed: string[] = [];
    let stop = false;
    let n = 0;
    // A writer that keeps creating users while the backup runs.
    const load = (async () => {
      while (!stop && n < 400) {
        const email = `load-${n++}@demo.example`;
        const res = await t.http
          .post('/api/users')
          .set('Authorization', `Bearer ${admin}`)
          .send({ email, name: `Load ${n}`, role: 'clerk', password: 'long-enough-pw' });
        if (res.status === 201) confirmed.push(email);
      }
    })();
    while (confirmed.length < 5) await new Promise((r) => setTimeout(r, 20));
    const before = [...confirmed];
    const target = join(t.dir, 'backups', 'gaugeproof-backup.sqlite');
    await backupDatabase(t.config.dbPath, target);
    copyFolder(t.config.uploadDir, `${target}.uploads`);
    stop = true;
    await load;

    const integrity = query<{ integrity_check: string }>(target, 'PRAGMA integrity_check');
    expect(integrity).toEqual([{ integrity_check: 'ok' }]);
    const inBackup = query<{ email: string }>(target, 'select email from users').map(
      (r) => r.email,
    );
    // Every write answered before the backup started is in it.
    expect(inBackup).toEqual(expect.arrayContaining(before));
    expect(existsSync(join(`${target}.uploads`, 'photo-1.png'))).toBe(true);
    expect(existsSync(`${target}.partial`)).toBe(false);

    const restoredPath = join(t.dir, 'restored', 'gaugeproof.sqlite');
    restoreDatabase(target, restoredPath);
    for (const table of ['users', 'audit_events', 'mikro_orm_migrations']) {
      const a = query(target, `select * from ${table} order by id`);
      const b = query(restoredPath, `select * from ${table} order by id`);
      expect(b).toEqual(a);
    }
    const restoredUploads = join(t.dir, 'restored', 'uploads');
    copyFolder(`${target}.uploads`, restoredUploads);
    expect(readdirSync(restoredUploads)).toEqual(['photo-1.png']);
  });

  it('refuses a backup of a database that does not exist, leaving nothing', async () => {
    const target = join(t.dir, 'none', 'x.sqlite');
    await expect(backupDatabase(join(t.dir, 'missing.sqlite'), target)).rejects.toThrow(
      /No database/,
    );
    expect(existsSync(target)).toBe(false);
  });
});
