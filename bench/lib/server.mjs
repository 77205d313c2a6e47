// Starts the production server (apps/backend/dist/main.js) on a scratch copy of the data
// set and signs in; reads its peak resident memory from /proc.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';

const ROOT = join(import.meta.dirname, '..', '..');

export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

/** VmHWM of a process (its peak resident set), in MB. */
export function peakRssMb(pid) {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/^VmHWM:\s+(\d+)\s+kB/m.exec(status)?.[1]);
  return kb / 1024;
}

/**
 * How long a start may take: the first start on a copy of a cached data set applies the
 * migrations added since it was built, which rebuild tables of a 2 GB file on a busy
 * machine (our choice).
 */
const START_LIMIT_MS = 15 * 60_000;

async function waitForHealth(base, child, logs) {
  const deadline = Date.now() + START_LIMIT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null)
      throw new Error(`server exited (${child.exitCode}):\n${logs.join('')}`);
    try {
      const res = await fetch(`${base}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(
    `server did not answer /api/health within ${START_LIMIT_MS / 1000} s:\n${logs.join('')}`,
  );
}

export async function startServer({ dbPath, uploadDir }) {
  const port = await freePort();
  const logs = [];
  const child = spawn(process.execPath, [join(ROOT, 'apps/backend/dist/main.js')], {
    cwd: ROOT,
    env: {
      ...process.env,
      PORT: String(port),
      DB_PATH: dbPath,
      UPLOAD_DIR: uploadDir,
      JWT_SECRET: 'bench-secret-not-for-production-0001',
      SEED_DEMO: 'false',
      LOG_LEVEL: 'warn',
      NODE_ENV: 'production',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const keep = (chunk) => {
    logs.push(chunk.toString());
    if (logs.length > 200) logs.shift();
  };
  child.stdout.on('data', keep);
  child.stderr.on('data', keep);
  const base = `http://127.0.0.1:${port}`;
  await waitForHealth(base, child, logs);
  return {
    base,
    pid: child.pid,
    logs,
    async stop() {
      if (child.exitCode !== null) return;
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
      await exited;
      clearTimeout(timer);
    },
  };
}

export async function signIn(base, email, password) {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200)
    throw new Error(`sign-in of ${email} answered ${res.status}: ${await res.text()}`);
  const body = await res.json();
  return body.accessToken;
}

/**
 * GET as JSON. A kept-alive socket the server closed while idle (a long raw-SQL phase
 * between two calls) fails as "fetch failed" before any request was sent: tried once more.
 */
export async function getJson(base, path, token) {
  const get = () => fetch(`${base}${path}`, { headers: { authorization: `Bearer ${token}` } });
  const res = await get().catch((e) => {
    if (e instanceof TypeError) return get();
    throw e;
  });
  if (!res.ok)
    throw new Error(`GET ${path} answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
  return res.json();
}
