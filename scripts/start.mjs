// Runs the built product: a local MailDev inbox (unless SMTP_URL is set) and the server.
import { spawn } from 'node:child_process';
import { createConnection } from 'node:net';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const children = [];

function portInUse(port) {
  return new Promise((resolve) => {
    const socket = createConnection({ port, host: '127.0.0.1' });
    socket.once('connect', () => (socket.destroy(), resolve(true)));
    socket.once('error', () => resolve(false));
  });
}

function run(cmd, args, env) {
  const child = spawn(cmd, args, { cwd: root, env, stdio: 'inherit' });
  children.push(child);
  return child;
}

const env = { ...process.env };
if (!env.SMTP_URL) {
  const smtpPort = 1025;
  const webPort = 1080;
  if (await portInUse(smtpPort)) {
    console.log(`Port ${smtpPort} is taken; using the SMTP server already there.`);
  } else {
    run(
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
      env,
    );
    console.log(`MailDev inbox: http://localhost:${webPort} (SMTP 127.0.0.1:${smtpPort})`);
  }
  env.SMTP_URL = `smtp://127.0.0.1:${smtpPort}`;
}

const server = run(process.execPath, [join(root, 'apps/backend/dist/main.js')], env);
server.on('exit', (code) => {
  for (const c of children) if (c !== server) c.kill('SIGTERM');
  process.exit(code ?? 0);
});
for (const sig of ['SIGINT', 'SIGTERM']) {
  process.on(sig, () => children.forEach((c) => c.kill(sig)));
}
