import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { DEMO_PASSWORD } from '../../src/seed/seed-users';
import { freePort } from './free-port';

const REPO = resolve(__dirname, '..', '..', '..', '..');
export const SERVER_JS = join(REPO, 'apps', 'backend', 'dist', 'main.js');

export { freePort };

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

  /** Calls the server's API, JSON in and out, with a bearer token when one is given. */
  async call<T = Record<string, unknown>>(
    method: string,
    path: string,
    token?: string,
    body?: unknown,
  ): Promise<{ status: number; text: string; body: T }> {
    const res = await fetch(`${this.url}${path}`, {
      method,
      headers: {
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
        'Content-Type': 'application/json',
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    return { status: res.status, text, body: (text ? JSON.parse(text) : {}) as T };
  }

  /** Signs a demo user in; answers the bearer token. */
  async signIn(email: string): Promise<string> {
    const res = await this.call<{ accessToken: string }>('POST', '/api/auth/login', undefined, {
      email,
      password: DEMO_PASSWORD,
    });
    return res.body.accessToken;
  }

  get pid(): number | undefined {
    return this.child?.pid;
  }
}
