import { spawn, type ChildProcess } from 'node:child_process';
import { resolve } from 'node:path';
import { freePort } from './free-port';

/** The CLI of the `maildev` npm package (its package only exports an ES module). */
const MAILDEV_BIN = resolve(__dirname, '../../../../node_modules/maildev/dist/bin/maildev.js');

export interface MailDevEmail {
  id: string;
  subject: string;
  text?: string;
  to: { address: string; name?: string }[];
  attachments?: {
    fileName?: string;
    generatedFileName?: string;
    contentType: string;
    length?: number;
  }[];
}

export interface MailDev {
  smtpPort: number;
  webPort: number;
  smtpUrl: string;
  emails(): Promise<MailDevEmail[]>;
  attachment(emailId: string, fileName: string): Promise<Buffer>;
  stop(): Promise<void>;
}

export { freePort };

async function waitForWeb(port: number, child: ChildProcess): Promise<void> {
  const until = Date.now() + 20_000;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`MailDev exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`http://127.0.0.1:${port}/api/email`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error('MailDev did not start within 20 s');
}

/** Starts a real MailDev bound to 127.0.0.1 (SMTP and web), on free ports unless given. */
export async function startMailDev(smtpPort?: number): Promise<MailDev> {
  const smtp = smtpPort ?? (await freePort());
  const web = await freePort();
  const child = spawn(
    process.execPath,
    [
      MAILDEV_BIN,
      '--smtp',
      String(smtp),
      '--web',
      String(web),
      '--ip',
      '127.0.0.1',
      '--web-ip',
      '127.0.0.1',
      '--silent',
    ],
    { stdio: 'ignore' },
  );
  await waitForWeb(web, child);
  const base = `http://127.0.0.1:${web}/api/email`;
  return {
    smtpPort: smtp,
    webPort: web,
    smtpUrl: `smtp://127.0.0.1:${smtp}`,
    async emails() {
      return (await (await fetch(base)).json()) as MailDevEmail[];
    },
    async attachment(emailId, fileName) {
      const res = await fetch(`${base}/${emailId}/attachment/${encodeURIComponent(fileName)}`);
      if (!res.ok) throw new Error(`attachment ${fileName}: ${res.status}`);
      return Buffer.from(await res.arrayBuffer());
    },
    stop() {
      return new Promise((done) => {
        if (child.exitCode !== null) return done();
        child.once('exit', () => done());
        child.kill('SIGTERM');
      });
    },
  };
}
