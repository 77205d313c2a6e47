import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from './free-port';
// s3rver ships no type declarations.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver = require('s3rver') as new (options: Record<string, unknown>) => {
  run(): Promise<{ port: number }>;
  close(): Promise<void>;
};

/** A local S3 fake (s3rver) on a free loopback port, with one bucket. */
export async function startS3Fake(bucket: string) {
  const dir = mkdtempSync(join(tmpdir(), 'gp-s3-'));
  const port = await freePort();
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: bucket }],
  });
  await server.run();
  return {
    endpoint: `http://127.0.0.1:${port}`,
    dir,
    env: {
      S3_BUCKET: bucket,
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
      S3_FORCE_PATH_STYLE: 'true',
    },
    async close() {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
