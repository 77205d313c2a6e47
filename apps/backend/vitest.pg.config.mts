import { defineConfig, mergeConfig } from 'vitest/config';
import base from './vitest.config.mts';

// The API suite again, on PostgreSQL: every test app gets its own scratch database on the
// server named by TEST_PG_ADMIN_URL (see test/helpers/test-app.ts), plus the *.pg-spec.ts checks.
export default mergeConfig(
  base,
  defineConfig({
    test: {
      include: ['test/**/*.e2e-spec.ts', 'test/**/*.pg-spec.ts'],
      // SQLite-only checks: the migration comparison and the SQLite backup tool.
      exclude: ['test/migrations.e2e-spec.ts', 'test/backup.e2e-spec.ts'],
    },
  }),
);
