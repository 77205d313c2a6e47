// `npm start` (scripts/start.mjs) as a newcomer runs it, with its settings: the ports
// moved, nothing rebuilt when nothing changed, the banner, routes only at debug level.
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createConnection, createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, test } from 'node:test';
import { buildChanged } from '../lib/build-changed.mjs';

const repo = join(import.meta.dirname, '..', '..');
const scratch = mkdtempSync(join(tmpdir(), 'gp-start-'));
after(() => rmSync(scratch, { recursive: true, force: true }));

// The start test needs a built tree, as `npm test` leaves it; build what is missing.
before(async () => {
  await buildChanged(repo);
});

function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

function listening(port) {
  return new Promise((resolve) => {
    const socket = createConnection({ port, host: '127.0.0.1' });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

/** The greeting line an SMTP server sends on connect. */
function smtpGreeting(port) {
  return new Promise((resolve, reject) => {
    const socket = createConnection({ port, host: '127.0.0.1' });
    socket.once('data', (d) => {
      socket.destroy();
      resolve(String(d));
    });
    socket.once('error', reject);
  });
}

/** Runs start.mjs until `until` matches its output (or it exits); returns its handle. */
function start(env, until = /Gaugeproof is ready[\s\S]*stop {9}Ctrl\+C/) {
  const child = spawn(process.execPath, [join(repo, 'scripts/start.mjs')], {
    cwd: repo,
    env: { PATH: process.env.PATH, HOME: process.env.HOME, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const run = { child, output: '', exitCode: null };
  run.exited = new Promise((resolve) => {
    child.on('exit', (code) => {
      run.exitCode = code;
      resolve(code);
    });
  });
  child.stdout.on('data', (d) => (run.output += d));
  child.stderr.on('data', (d) => (run.output += d));
  run.ready = new Promise((resolve, reject) => {
    const timer = setTimeout(
      () => reject(new Error(`no banner in 120 s:\n${run.output}`)),
      120_000,
    );
    const check = () => {
      if (!until.test(run.output)) return;
      clearTimeout(timer);
      resolve();
    };
    child.stdout.on('data', check);
    child.stderr.on('data', check);
    void run.exited.then(() => {
      clearTimeout(timer);
      if (until.test(run.output)) resolve();
      else reject(new Error(`start.mjs exited (${run.exitCode}):\n${run.output}`));
    });
  });
  return run;
}

async function stop(run) {
  if (run.exitCode === null) run.child.kill('SIGINT');
  await run.exited;
}

test('moved ports, nothing rebuilt, a banner with the inbox, demo accounts and data', async () => {
  const [port, smtp, web] = [await freePort(), await freePort(), await freePort()];
  const dir = join(scratch, 'one');
  const run = start({
    PORT: String(port),
    MAILDEV_SMTP_PORT: String(smtp),
    MAILDEV_WEB_PORT: String(web),
    DB_PATH: join(dir, 'db.sqlite'),
    UPLOAD_DIR: join(dir, 'uploads'),
    SEED_DEMO: 'catalog',
    LOG_LEVEL: 'info',
  });
  try {
    await run.ready;
    const out = run.output;
    assert.match(out, /Nothing changed since the last build\./);
    assert.doesNotMatch(out, /building /);
    assert.match(out, new RegExp(`Gaugeproof is ready: http://127\\.0\\.0\\.1:${port}\n`));
    assert.match(
      out,
      new RegExp(
        `mail inbox {3}http://127\\.0\\.0\\.1:${web}/index\\.html \\(SMTP 127\\.0\\.0\\.1:${smtp}\\)`,
      ),
    );
    assert.match(
      out,
      /demo {9}clerk@demo\.example, qa@demo\.example, buyer@demo\.example, admin@demo\.example/,
    );
    assert.match(out, /password gaugeproof-demo/);
    assert.ok(out.includes(`database     ${join(dir, 'db.sqlite')}`), out);
    assert.ok(out.includes(`photos       ${join(dir, 'uploads')}`), out);
    assert.match(out, /phones {7}only this machine can connect: HOST=0\.0\.0\.0 PUBLIC_URL=/);

    const health = await fetch(`http://127.0.0.1:${port}/api/health`);
    assert.equal(health.status, 200);
    const inbox = await fetch(`http://127.0.0.1:${web}/api/email`);
    assert.equal(inbox.status, 200);
    assert.deepEqual(await inbox.json(), []);
    assert.match(await smtpGreeting(smtp), /^220 /);
  } finally {
    await stop(run);
  }
  // the route list is at debug level, below the default (read once everything is out)
  assert.doesNotMatch(run.output, /Mapped \{|dependencies initialized/);
  assert.equal(await listening(port), false, 'the server stopped with start.mjs');
  assert.equal(await listening(smtp), false, 'MailDev stopped with start.mjs');
});

test('with SMTP_URL no inbox starts; HOST, PUBLIC_URL, no demo, routes at debug', async () => {
  const port = await freePort();
  const dir = join(scratch, 'two');
  const run = start(
    {
      PORT: String(port),
      HOST: '0.0.0.0',
      PUBLIC_URL: 'http://192.0.2.10:8080',
      SMTP_URL: 'smtp://127.0.0.1:9',
      DB_PATH: join(dir, 'db.sqlite'),
      UPLOAD_DIR: join(dir, 'uploads'),
      SEED_DEMO: 'false',
      LOG_LEVEL: 'debug',
    },
    // the server's log lines may arrive after the banner
    /(?=[\s\S]*stop {9}Ctrl\+C)(?=[\s\S]*Mapped \{\/api\/health, GET\} route)/,
  );
  try {
    await run.ready;
    const out = run.output;
    assert.match(out, new RegExp(`Gaugeproof is ready: http://localhost:${port}\n`));
    assert.match(
      out,
      /mail inbox {3}none started; mail goes to SMTP_URL \(smtp:\/\/127\.0\.0\.1:9\)/,
    );
    assert.match(out, /demo {9}not seeded/);
    assert.match(out, /QR codes {5}point at http:\/\/192\.0\.2\.10:8080/);
    assert.match(out, /Mapped \{\/api\/health, GET\} route/);
    assert.equal((await fetch(`http://127.0.0.1:${port}/api/health`)).status, 200);
  } finally {
    await stop(run);
  }
});

test('a taken mail port stops the start with the setting that moves it', async () => {
  const taken = createServer();
  await new Promise((resolve) => taken.listen(0, '127.0.0.1', resolve));
  const smtp = taken.address().port;
  try {
    const run = start(
      {
        PORT: String(await freePort()),
        MAILDEV_SMTP_PORT: String(smtp),
        MAILDEV_WEB_PORT: String(await freePort()),
        DB_PATH: join(scratch, 'three', 'db.sqlite'),
      },
      /$^/,
    );
    await assert.rejects(run.ready);
    assert.equal(run.exitCode, 1);
    assert.match(
      run.output,
      new RegExp(
        `Port ${smtp} for the local mail server is taken\\. Move it, e\\.g\\. MAILDEV_SMTP_PORT=`,
      ),
    );
    assert.doesNotMatch(run.output, /Gaugeproof is ready/);
  } finally {
    taken.close();
  }
});
