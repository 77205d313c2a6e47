import { Injectable } from '@nestjs/common';
import { ThrottlerException, ThrottlerGuard } from '@nestjs/throttler';

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
