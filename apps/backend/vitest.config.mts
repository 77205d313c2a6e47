import swc from 'unplugin-swc';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  resolve: { conditions: ['@gaugeproof/source'] },
  ssr: { resolve: { conditions: ['@gaugeproof/source'] } },
  test: {
    include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
    environment: 'node',
    // Each API test file boots its own app on its own SQLite file.
    pool: 'forks',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: { NODE_ENV: 'test', LOG_LEVEL: 'silent' },
  },
});
