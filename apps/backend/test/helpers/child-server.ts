import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';

const REPO = resolve(__dirname, '..', '..', '..', '..');
export const SERVER_JS = join(REPO, 'apps', 'backend', 'dist', 'main.js');

export async function freePort(): Promise<number> {
  return new Promise((res, rej) => {
    const srv = createServer();
    srv.once('error', rej);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => res(port));
    });
  });
}

/** The production server (`node apps/backend/dist/main.js`) as a child process. */
export class ChildServer {
  private child: ChildProcess | null = null;
  readonly url: string;
  output = '';

  constructor(
    readonly port: number,
    private readonly env: Record<string, string>,
  ) {
    this.url = `http://127.0.0.1:${port}`;
  }

  async start(): Promise<void> {
    if (!existsSync(SERVER_JS)) {
      throw new Error(`${SERVER_JS} is missing: run "npm run build" first`);
    }
    this.output = '';
    const child = spawn(process.execPath, [SERVER_JS], {
      env: { ...process.env, PORT: String(this.port), LOG_LEVEL: 'warn', ...this.env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout?.on('data', (d: Buffer) => (this.output += d.toString()));
    child.stderr?.on('data', (d: Buffer) => (this.output += d.toString()));
    this.child = child;
    const deadline = Date.now() + 60_000;
    while (Date.now() < deadline) {
      if (child.exitCode !== null) throw new Error(`server exited: ${this.output}`);
      try {
        const res = await fetch(`${this.url}/api/health`);
        if (res.ok) return;
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 150));
    }
    throw new Error(`server did not answer /api/health: ${this.output}`);
  }

  /** Ends the process without any chance to clean up, as a power cut or OOM kill would. */
  async kill(signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    await new Promise<void>((res) => {
      child.once('exit', () => res());
      child.kill(signal);
    });
    this.child = null;
  }

  get pid(): number | undefined {
    return this.child?.pid;
  }
}
