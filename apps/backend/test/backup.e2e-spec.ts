import { existsSync, mkdirSync, readdirSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase, copyFolder, restoreDatabase } from '../src/ops/sqlite-backup';
import { DatabaseInUseError, serverHoldsDatabase } from '../src/ops/server-lock';
import { SWEEP_GRACE_MS } from '../src/storage/upload-sweep';
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

  it('refuses to restore over a database a server holds, saying how to stop it, and changes nothing', async () => {
    const admin = await t.token(DEMO.admin);
    const target = join(t.dir, 'backups', 'before-restore.sqlite');
    await backupDatabase(t.config.dbPath, target);
    // Acknowledged after the backup: a restore now would lose it.
    const later = await t.http.post('/api/users').set('Authorization', `Bearer ${admin}`).send({
      email: 'after-backup@demo.example',
      name: 'After',
      role: 'clerk',
      password: 'long-enough-pw',
    });
    expect(later.status).toBe(201);
    expect(serverHoldsDatabase(t.config.dbPath)).toBe(true);
    expect(() => restoreDatabase(target, t.config.dbPath)).toThrow(DatabaseInUseError);
    expect(() => restoreDatabase(target, t.config.dbPath)).toThrow(
      /Stop every server using this database/,
    );
    const users = await t.http.get('/api/users').set('Authorization', `Bearer ${admin}`);
    expect(users.body.map((u: { email: string }) => u.email)).toContain(
      'after-backup@demo.example',
    );
  });

  it('restores once the server has stopped', async () => {
    const other = await startTestApp();
    const target = join(other.dir, 'copy.sqlite');
    await backupDatabase(other.config.dbPath, target);
    const dbPath = other.config.dbPath;
    await other.app.close();
    expect(serverHoldsDatabase(dbPath)).toBe(false);
    restoreDatabase(target, dbPath);
    expect(query<{ n: number }>(dbPath, 'select count(*) as n from users')[0].n).toBe(4);
    await other.close().catch(() => undefined);
  });
});

describe('upload sweep at start', () => {
  it('removes partial and orphan files older than the grace time, keeps the rest', async () => {
    const first = await startTestApp();
    const { dbPath, uploadDir } = first.config;
    // A photo with its row: kept.
    const photos = join(uploadDir, 'photos');
    mkdirSync(photos, { recursive: true });
    await first.app.close();
    const old = new Date(Date.now() - SWEEP_GRACE_MS - 60_000);
    const files = {
      partial: join(photos, '.0b7e-cut-off.tmp'),
      orphan: join(photos, 'c0ffee00-0000-4000-8000-000000000001.jpg'),
      fresh: join(photos, 'c0ffee00-0000-4000-8000-000000000002.jpg'),
      other: join(uploadDir, 'notes.txt'),
    };
    for (const f of Object.values(files)) writeFileSync(f, 'x');
    for (const f of [files.partial, files.orphan, files.other]) utimesSync(f, old, old);
    const again = await startTestApp({
      DB_PATH: dbPath,
      UPLOAD_DIR: uploadDir,
      ...(first.config.dbUrl ? { DB_URL: first.config.dbUrl } : {}),
    });
    try {
      expect(existsSync(files.partial)).toBe(false);
      expect(existsSync(files.orphan)).toBe(false);
      expect(existsSync(files.fresh)).toBe(true);
      expect(existsSync(files.other)).toBe(true);
    } finally {
      await again.close();
      await first.close().catch(() => undefined);
    }
  });
});
