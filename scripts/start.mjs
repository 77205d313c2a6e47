// `npm start`: builds what changed since the last build, runs a local MailDev inbox
// (unless SMTP_URL points at a mail server) and the server, then prints a short banner.
//
// Settings (environment): PORT, HOST (default 127.0.0.1: this machine only; 0.0.0.0 for
// phones and tablets on the dock network), PUBLIC_URL (the address QR codes and e-mails
// carry), MAILDEV_SMTP_PORT (default 1025), MAILDEV_WEB_PORT (default 1080), SMTP_URL, and
// every server setting of the README's Configuration table. SEED_DEMO defaults to `true`
// here: the quick start shows the demo.
import { spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildChanged } from './lib/build-changed.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const children = [];
let stopping = false;

function fail(message) {
  console.error(message);
  stop('SIGTERM');
  process.exit(1);
}

function stop(signal) {
  stopping = true;
  for (const c of children) if (c.exitCode === null) c.kill(signal);
}

/** True when nothing listens on host:port (tried by listening there for a moment). */
function portFree(port, host) {
  return new Promise((resolve) => {
    const srv = createServer();
    srv.once('error', () => resolve(false));
    srv.listen({ port, host, exclusive: true }, () => srv.close(() => resolve(true)));
  });
}

function portSetting(env, name, fallback) {
  const raw = env[name] ?? String(fallback);
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    fail(`${name} must be a whole number from 1 to 65535 (got "${raw}")`);
  }
  return port;
}

const env = { ...process.env };
env.SEED_DEMO ??= 'true';
env.HOST ||= '127.0.0.1';
const port = portSetting(env, 'PORT', 3000);
const smtpPort = portSetting(env, 'MAILDEV_SMTP_PORT', 1025);
const webPort = portSetting(env, 'MAILDEV_WEB_PORT', 1080);

if (!(await portFree(port, env.HOST))) {
  fail(
    `Port ${port} on ${env.HOST} is taken (another Gaugeproof?). Start on another: PORT=3001 npm start`,
  );
}
let inbox = null;
if (!env.SMTP_URL) {
  for (const [p, name] of [
    [smtpPort, 'MAILDEV_SMTP_PORT'],
    [webPort, 'MAILDEV_WEB_PORT'],
  ]) {
    if (!(await portFree(p, '127.0.0.1'))) {
      fail(
        `Port ${p} for the local mail server is taken. Move it, e.g. ${name}=${p + 10000} npm start` +
          ' (or set SMTP_URL to a mail server of your own).',
      );
    }
  }
}

const t0 = Date.now();
try {
  const results = await buildChanged(root, { log: (line) => console.log(line) });
  if (results.every((r) => !r.built)) console.log('Nothing changed since the last build.');
  else console.log(`Build done in ${((Date.now() - t0) / 1000).toFixed(1)} s.`);
} catch (e) {
  fail(e.message);
}

if (!env.SMTP_URL) {
  const maildev = spawn(
    process.execPath,
    [
      join(root, 'node_modules/maildev/dist/bin/maildev.js'),
      '--smtp',
      String(smtpPort),
      '--web',
      String(webPort),
      '--ip',
      '127.0.0.1',
      '--web-ip',
      '127.0.0.1',
      '--silent',
    ],
    { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] },
  );
  children.push(maildev);
  maildev.on('exit', (code) => {
    if (!stopping) fail(`The local mail server stopped (exit code ${code}).`);
  });
  env.SMTP_URL = `smtp://127.0.0.1:${smtpPort}`;
  inbox = `http://127.0.0.1:${webPort}/index.html (SMTP 127.0.0.1:${smtpPort})`;
}

const server = spawn(process.execPath, [join(root, 'apps/backend/dist/main.js')], {
  cwd: root,
  env,
  stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
});
children.push(server);
server.on('message', (msg) => {
  if (msg?.type === 'gaugeproof:ready') console.log(banner(msg));
});
server.on('exit', (code) => {
  stop('SIGTERM');
  process.exit(code ?? 0);
});
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => stop(sig));

function banner(ready) {
  const lines = [
    '',
    `Gaugeproof is ready: ${ready.url}`,
    `  mail inbox   ${inbox ?? `none started; mail goes to SMTP_URL (${env.SMTP_URL.replace(/\/\/[^@/]*@/, '//…@')})`}`,
  ];
  if (ready.demoAccounts.length > 0) {
    lines.push(
      `  demo         ${ready.demoAccounts.map((a) => a.email).join(', ')}`,
      `               password ${ready.demoPassword} (demo data only; README "Demo accounts")`,
    );
  } else {
    lines.push('  demo         not seeded (SEED_DEMO=true seeds it into an empty database)');
  }
  lines.push(`  database     ${ready.database}`, `  photos       ${ready.photos}`);
  const local = ready.host === '127.0.0.1' || ready.host === 'localhost' || ready.host === '::1';
  lines.push(
    local
      ? '  phones       only this machine can connect: HOST=0.0.0.0 PUBLIC_URL=http://<this machine>:' +
          `${ready.port} npm start (README "Quick start")`
      : `  QR codes     point at ${ready.publicUrl}`,
    '  stop         Ctrl+C',
    '',
  );
  return lines.join('\n');
}
