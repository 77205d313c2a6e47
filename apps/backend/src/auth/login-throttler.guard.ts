import { Injectable } from '@nestjs/common';
import { ThrottlerException, ThrottlerGuard } from '@nestjs/throttler';

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
 * throttler through AppConfig (auth.module.ts).
 */
export const LOGIN_TRIES_PER_ACCOUNT = 5;

/**
 * Sign-in attempts are counted per client address and e-mail together (the `default`
 * throttler), and per address alone (`address`, auth.module.ts). The address is the
 * connection's unless TRUST_PROXY names the proxy in front.
 */
@Injectable()
export class LoginThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    const body = req.body as { email?: unknown } | undefined;
    const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
    return `${String(req.ip)}|${email}`;
  }

  protected override async throwThrottlingException(): Promise<void> {
    throw new ThrottlerException('Too many sign-in attempts. Wait a minute and try again.');
  }
}
