import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { isIP } from 'node:net';
import { dirname, join, resolve } from 'node:path';

/**
 * Sign-in tries one address may make in a minute over all accounts, unless
 * SIGN_IN_TRIES_PER_ADDRESS says otherwise (our choice: a shop's shared terminal signing
 * in a shift's staff stays well below it).
 */
export const LOGIN_TRIES_PER_ADDRESS = 30;

/**
 * Sign-in tries one address may make in a minute at one account, unless
 * SIGN_IN_TRIES_PER_ACCOUNT says otherwise (our choice). Both limits can be raised for a
 * shop whose staff all sign in from one address behind a router, and the browser-test
 * runner raises them because every test signs in from 127.0.0.1. They come to the
 * throttler through AppConfig (sessions/auth.module.ts).
 */
export const LOGIN_TRIES_PER_ACCOUNT = 5;

/** Everything the server reads from its environment, checked once at start-up. */
export interface AppConfig {
  port: number;
  /** Address the server listens on: 127.0.0.1 (this machine only) unless HOST says otherwise. */
  host: string;
  dbPath: string;
  /** postgresql://… when set; the SQLite file is used otherwise. */
  dbUrl: string | null;
  uploadDir: string;
  smtpUrl: string | null;
  mailFrom: string;
  /** The outbound queue: how often each server looks for due mail, back-off and attempts. */
  mail: { queuePollMs: number; retryBaseMs: number; maxAttempts: number };
  /**
   * Staff notices (issue 14): how often each server looks for lots awaiting a decision and
   * overdue SCARs and sends due digests (NOTICE_POLL_MS, 0 = never), and the hour (UTC) from
   * which the daily digest goes (DIGEST_HOUR_UTC).
   */
  notices: { pollMs: number; digestHourUtc: number };
  /** ISO 4217 code of new returns' amounts unless purchasing picks another (CURRENCY). */
  currency: string;
  jwtSecret: string;
  seedDemo: boolean;
  /** SEED_DEMO=catalog seeds users and catalog only, without the scenario's history. */
  seedHistory: boolean;
  /** Extra origins allowed to send cookie-authenticated writes (comma-separated). */
  appOrigins: string[];
  /** Public address of the app, used in QR codes and e-mails. */
  publicUrl: string;
  logLevel: string;
  frontendDist: string;
  /** Where photos go: the local UPLOAD_DIR, or an S3 bucket shared by several servers. */
  storage: StorageConfig;
  /**
   * Express's `trust proxy` from TRUST_PROXY: false unless set, so a client cannot pick its
   * own address (sign-in throttle, logs) with X-Forwarded-For. Set it to the proxies in
   * front of the server: `loopback`, addresses or subnets (comma-separated), or a hop count.
   */
  trustProxy: boolean | number | string;
  /**
   * Sign-in tries a minute from one address: at one account (SIGN_IN_TRIES_PER_ACCOUNT) and
   * over all accounts (SIGN_IN_TRIES_PER_ADDRESS); sessions/login-throttler.guard.ts.
   */
  signInTries: { perAccount: number; perAddress: number };
}

export type StorageConfig =
  | { kind: 'local' }
  | {
      kind: 's3';
      bucket: string;
      region: string;
      endpoint?: string;
      accessKeyId?: string;
      secretAccessKey?: string;
      forcePathStyle: boolean;
    };

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Gaugeproof cannot start; fix these settings:\n  - ${problems.join('\n  - ')}`);
  }
}

const REPO_ROOT = resolve(__dirname, '..', '..', '..', '..');

function fromRepo(p: string): string {
  return resolve(REPO_ROOT, p);
}

/** Reads the JWT secret from the data folder, creating one (mode 0600) on first start. */
function persistentSecret(dataDir: string): string {
  const file = join(dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  chmodSync(file, 0o600);
  return secret;
}

/** An ISO 4217 code the runtime knows (Intl lists the active codes). */
export function isCurrencyCode(code: string): boolean {
  return /^[A-Z]{3}$/.test(code) && Intl.supportedValuesOf('currency').includes(code);
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const problems: string[] = [];
  const port = Number(env.PORT ?? '3000');
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    problems.push(`PORT must be a whole number from 1 to 65535 (got "${env.PORT}")`);
  }
  const host = env.HOST?.trim() || '127.0.0.1';
  if (isIP(host) === 0 && !/^[a-zA-Z0-9]([a-zA-Z0-9.-]{0,251}[a-zA-Z0-9])?$/.test(host)) {
    problems.push(
      `HOST must be an IP address or a host name, e.g. 0.0.0.0 for every network (got "${env.HOST}")`,
    );
  }
  const dbPath = fromRepo(env.DB_PATH || 'data/gaugeproof.sqlite');
  const dbUrl = env.DB_URL?.trim() || null;
  if (dbUrl && !/^postgres(ql)?:\/\//.test(dbUrl)) {
    problems.push('DB_URL must start with postgresql:// (leave it empty for the SQLite file)');
  }
  const uploadDir = fromRepo(env.UPLOAD_DIR || 'data/uploads');
  const smtpUrl = env.SMTP_URL?.trim() || null;
  if (smtpUrl && !/^smtps?:\/\//.test(smtpUrl)) {
    problems.push('SMTP_URL must start with smtp:// or smtps:// (leave it empty to log mail)');
  }
  // Demo data only when asked for (npm start asks); a production database starts empty.
  const seedRaw = (env.SEED_DEMO || 'false').toLowerCase();
  if (!['true', 'false', 'catalog'].includes(seedRaw)) {
    problems.push(`SEED_DEMO must be "true", "catalog" or "false" (got "${env.SEED_DEMO}")`);
  }
  const jwtSecret = env.JWT_SECRET?.trim();
  if (jwtSecret !== undefined && jwtSecret !== '' && jwtSecret.length < 16) {
    problems.push('JWT_SECRET must be at least 16 characters (or unset to generate one)');
  }
  const logLevel = env.LOG_LEVEL || 'info';
  if (!['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'].includes(logLevel)) {
    problems.push(`LOG_LEVEL must be one of fatal, error, warn, info, debug, trace, silent`);
  }
  const bucket = env.S3_BUCKET?.trim();
  if (bucket && !/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(bucket)) {
    problems.push(
      'S3_BUCKET must be a valid bucket name (lower-case letters, digits, dots, dashes)',
    );
  }
  if (env.S3_ENDPOINT && !/^https?:\/\//.test(env.S3_ENDPOINT)) {
    problems.push('S3_ENDPOINT must start with http:// or https://');
  }
  const whole = (name: string, fallback: number, min: number, max: number) => {
    const raw = env[name];
    const n = raw === undefined || raw === '' ? fallback : Number(raw);
    if (!Number.isInteger(n) || n < min || n > max) {
      problems.push(`${name} must be a whole number from ${min} to ${max} (got "${raw}")`);
      return fallback;
    }
    return n;
  };
  const mail = {
    queuePollMs: whole('MAIL_QUEUE_POLL_MS', 5_000, 0, 3_600_000),
    retryBaseMs: whole('MAIL_RETRY_BASE_MS', 60_000, 100, 86_400_000),
    maxAttempts: whole('MAIL_MAX_ATTEMPTS', 6, 1, 50),
  };
  const notices = {
    pollMs: whole('NOTICE_POLL_MS', 60_000, 0, 3_600_000),
    digestHourUtc: whole('DIGEST_HOUR_UTC', 6, 0, 23),
  };
  const signInTries = {
    perAccount: whole('SIGN_IN_TRIES_PER_ACCOUNT', LOGIN_TRIES_PER_ACCOUNT, 1, 100_000),
    perAddress: whole('SIGN_IN_TRIES_PER_ADDRESS', LOGIN_TRIES_PER_ADDRESS, 1, 100_000),
  };
  const currency = (env.CURRENCY || 'USD').trim().toUpperCase();
  if (!isCurrencyCode(currency)) {
    problems.push(`CURRENCY must be an ISO 4217 code such as EUR or USD (got "${env.CURRENCY}")`);
  }
  const trustRaw = env.TRUST_PROXY?.trim() ?? '';
  let trustProxy: boolean | number | string = false;
  if (trustRaw === '' || trustRaw === 'false') trustProxy = false;
  else if (trustRaw === 'true') trustProxy = true;
  else if (/^\d+$/.test(trustRaw)) trustProxy = Number(trustRaw);
  else if (/^[\w.:/, -]+$/.test(trustRaw)) trustProxy = trustRaw;
  else {
    problems.push(
      'TRUST_PROXY must be true, a hop count, or proxy addresses/subnets such as "loopback" or "10.0.0.0/8"',
    );
  }
  if (problems.length > 0) throw new ConfigError(problems);
  const storage: StorageConfig = bucket
    ? {
        kind: 's3',
        bucket,
        region: env.S3_REGION || 'us-east-1',
        endpoint: env.S3_ENDPOINT || undefined,
        accessKeyId: env.S3_ACCESS_KEY_ID || undefined,
        secretAccessKey: env.S3_SECRET_ACCESS_KEY || undefined,
        forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? 'true') !== 'false',
      }
    : { kind: 'local' };
  const publicUrl = (env.PUBLIC_URL || `http://localhost:${port}`).replace(/\/$/, '');
  return {
    port,
    host,
    dbPath,
    dbUrl,
    uploadDir,
    smtpUrl,
    mailFrom: env.MAIL_FROM || 'Gaugeproof <gaugeproof@localhost>',
    mail,
    notices,
    currency,
    jwtSecret: jwtSecret || persistentSecret(dirname(dbPath)),
    seedDemo: seedRaw !== 'false',
    seedHistory: seedRaw === 'true',
    appOrigins: (env.APP_ORIGINS ?? '')
      .split(',')
      .map((o) => o.trim())
      .filter(Boolean),
    publicUrl,
    logLevel,
    frontendDist: fromRepo('apps/frontend/dist'),
    storage,
    trustProxy,
    signInTries,
  };
}
