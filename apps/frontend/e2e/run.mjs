// Runs the browser tests against the built production server on a free port,
// with a scratch database and upload folder. Exit code = the tests' exit code.
import { spawn } from 'node:child_process';
import { createWriteStream, existsSync } from 'node:fs';
import { mkdir, readdir } from 'node:fs/promises';
import { createServer } from 'node:net';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const e2eDir = dirname(fileURLToPath(import.meta.url));
const frontendDir = resolve(e2eDir, '..');
const repoRoot = resolve(frontendDir, '../..');
const serverEntry = join(repoRoot, 'apps/backend/dist/main.js');

function freePort() {
  return new Promise((resolvePort, reject) => {
    const probe = createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address();
      probe.close(() => resolvePort(port));
    });
  });
}

async function waitForHealth(baseUrl, server, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (server.exitCode !== null)
      throw new Error(`server exited early with code ${server.exitCode}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.status === 200) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`GET /api/health did not answer 200 within ${timeoutMs / 1000} s`);
}

async function waitForMailDev(mailUrl, child, timeoutMs = 20_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`MailDev exited with code ${child.exitCode}`);
    try {
      if ((await fetch(`${mailUrl}/api/email`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error('MailDev did not start');
}

function stop(child) {
  if (child.exitCode !== null) return Promise.resolve();
  return new Promise((done) => {
    const force = setTimeout(() => child.kill('SIGKILL'), 5_000);
    child.once('exit', () => {
      clearTimeout(force);
      done();
    });
    child.kill('SIGTERM');
  });
}

async function main() {
  if (!existsSync(serverEntry)) {
    console.error(
      `No built server at ${serverEntry}. Run \`npm run build\` at the repository root.`,
    );
    return 1;
  }
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const scratch = join(frontendDir, 'test-output', `e2e-${stamp}`);
  const screenshotDir = join(frontendDir, 'test-output', 'screenshots');
  await mkdir(join(scratch, 'uploads'), { recursive: true });
  await mkdir(screenshotDir, { recursive: true });

  // A real MailDev takes the server's mail; tests read it at MAILDEV_URL (/api/email).
  const smtpPort = await freePort();
  const mailWebPort = await freePort();
  const maildev = spawn(
    process.execPath,
    [
      join(repoRoot, 'node_modules/maildev/dist/bin/maildev.js'),
      '--smtp',
      String(smtpPort),
      '--web',
      String(mailWebPort),
      '--ip',
      '127.0.0.1',
      '--web-ip',
      '127.0.0.1',
      '--silent',
    ],
    { stdio: 'ignore' },
  );
  const mailUrl = `http://127.0.0.1:${mailWebPort}`;
  await waitForMailDev(mailUrl, maildev);

  const port = await freePort();
  const baseUrl = `http://localhost:${port}`;
  const serverLog = join(scratch, 'server.log');
  const log = createWriteStream(serverLog);
  const server = spawn(process.execPath, [serverEntry], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      DB_PATH: join(scratch, 'gaugeproof.sqlite'),
      UPLOAD_DIR: join(scratch, 'uploads'),
      SEED_DEMO: 'true',
      JWT_SECRET: 'some-test-secret-for-e2e-only',
      SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
      // Every test signs in from 127.0.0.1; the limits themselves are tested in the API tests.
      SIGN_IN_TRIES_PER_ACCOUNT: '1000',
      SIGN_IN_TRIES_PER_ADDRESS: '1000',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  server.stdout.pipe(log);
  server.stderr.pipe(log);

  try {
    await waitForHealth(baseUrl, server);
    console.log(`server ready at ${baseUrl} (log: ${serverLog})`);
    // `node e2e/run.mjs auth` runs only the files whose names contain "auth".
    const only = process.argv.slice(2);
    const files = (await readdir(e2eDir))
      .filter((f) => f.endsWith('.e2e.mjs'))
      .filter((f) => only.length === 0 || only.some((word) => f.includes(word)))
      .sort();
    const tests = spawn(
      process.execPath,
      ['--test', '--test-concurrency=1', ...files.map((f) => join(e2eDir, f))],
      {
        cwd: frontendDir,
        env: {
          ...process.env,
          BASE_URL: baseUrl,
          MAILDEV_URL: mailUrl,
          SCREENSHOT_DIR: screenshotDir,
          E2E_SCRATCH: scratch,
        },
        stdio: 'inherit',
      },
    );
    const code = await new Promise((done) => tests.once('exit', (c) => done(c ?? 1)));
    return code;
  } catch (error) {
    console.error(String(error), `\nserver log: ${serverLog}`);
    return 1;
  } finally {
    await stop(server);
    await stop(maildev);
    log.end();
  }
}

process.exitCode = await main();
