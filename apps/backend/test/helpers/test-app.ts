import type { INestApplication, Type } from '@nestjs/common';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createApp } from '../../src/app.factory';
import { contractCheck } from './contract-check';
import { createScratchDatabase } from '../../src/database/pg-scratch';
import { loadConfig, type AppConfig } from '../../src/config/env';
import { DEMO_PASSWORD } from '../../src/seed/seed-users';

export const ORIGIN = 'http://127.0.0.1';

export interface TestApp {
  app: INestApplication;
  http: ReturnType<typeof request>;
  config: AppConfig;
  dir: string;
  /** Bearer token of a demo user, by e-mail. */
  token(email: string): Promise<string>;
  close(): Promise<void>;
}

/**
 * Boots the real application on a fresh SQLite file in a scratch folder. `overrides`
 * replace settings that have no environment variable (e.g. the built client's folder).
 */
export async function startTestApp(
  env: Record<string, string> = {},
  overrides: Partial<AppConfig> = {},
  domainModules?: readonly Type[],
): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'gp-test-'));
  // The PostgreSQL pass of the suite (npm run test:pg) gives each app its own database.
  const pgAdmin = process.env.TEST_PG_ADMIN_URL;
  const pg = pgAdmin ? await createScratchDatabase(pgAdmin, 'gp_test') : null;
  const loaded = loadConfig({
    ...(pg ? { DB_URL: pg.url } : {}),
    PORT: '3999',
    DB_PATH: join(dir, 'test.sqlite'),
    UPLOAD_DIR: join(dir, 'uploads'),
    JWT_SECRET: 'test-secret-that-is-long-enough',
    SEED_DEMO: 'catalog',
    LOG_LEVEL: 'silent',
    PUBLIC_URL: ORIGIN,
    ...env,
  });
  const config = { ...loaded, ...overrides };
  const app = await createApp(config, domainModules);
  const contract = contractCheck(app);
  app.use(contract.middleware);
  await app.init();
  const http = request(app.getHttpServer());
  const tokens = new Map<string, string>();
  return {
    app,
    http,
    config,
    dir,
    async token(email: string) {
      const known = tokens.get(email);
      if (known) return known;
      const res = await http.post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
      if (res.status !== 200) throw new Error(`login ${email}: ${res.status}`);
      tokens.set(email, res.body.accessToken as string);
      return res.body.accessToken as string;
    },
    async close() {
      await app.close();
      await pg?.drop();
      rmSync(dir, { recursive: true, force: true });
      if (contract.problems.length) {
        throw new Error(
          `Answers the OpenAPI document does not describe:\n${[...new Set(contract.problems)].join('\n')}`,
        );
      }
    },
  };
}

export const DEMO = {
  clerk: 'clerk@demo.example',
  qa: 'qa@demo.example',
  buyer: 'buyer@demo.example',
  admin: 'admin@demo.example',
} as const;
