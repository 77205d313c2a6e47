import {
  CallHandler,
  ExecutionContext,
  HttpException,
  HttpStatus,
  Injectable,
  NestInterceptor,
} from '@nestjs/common';
import type { Request, Response } from 'express';
import { catchError, type Observable } from 'rxjs';
import { UnknownLinkError } from './supplier-portal.service';

/**
 * Requests one client address may make to the public supplier pages in a minute: a supplier
 * opening the page, its photos and the evidence pack stays far below it (our choice).
 */
export const PORTAL_REQUESTS_PER_MINUTE = 120;
/**
 * Unknown tokens one address may try in ten minutes before it is refused for the rest of
 * the window (our choice): a mistyped link is tried a few times, a guesser many.
 */
export const PORTAL_BAD_TOKENS_PER_WINDOW = 10;
const MINUTE_MS = 60_000;
const BAD_WINDOW_MS = 10 * MINUTE_MS;
/** Addresses remembered at most; the oldest windows are dropped first. */
const MAX_TRACKED = 10_000;

interface Window {
  count: number;
  resetAt: number;
}

class Counter {
  private readonly windows = new Map<string, Window>();
  constructor(private readonly windowMs: number) {}

  /** The address's count in its current window after adding `by`. */
  add(key: string, by: number, now = Date.now()): Window {
    let w = this.windows.get(key);
    if (!w || w.resetAt <= now) {
      this.windows.delete(key);
      if (this.windows.size >= MAX_TRACKED) {
        const oldest = this.windows.keys().next().value;
        if (oldest !== undefined) this.windows.delete(oldest);
      }
      w = { count: 0, resetAt: now + this.windowMs };
      this.windows.set(key, w);
    }
    w.count += by;
    return w;
  }

  clear(): void {
    this.windows.clear();
  }
}

/**
 * Rate limit of the public supplier API, per client address (the connection's unless
 * TRUST_PROXY names the proxy in front): every request counts against a per-minute limit,
 * and a token that is not ours (404) counts against a stricter ten-minute one, so guessing
 * tokens is slowed to a crawl. In memory, per server. Answers 429 with Retry-After.
 */
@Injectable()
export class PortalThrottle implements NestInterceptor {
  private readonly requests = new Counter(MINUTE_MS);
  private readonly badTokens = new Counter(BAD_WINDOW_MS);

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const http = context.switchToHttp();
    const req = http.getRequest<Request>();
    const res = http.getResponse<Response>();
    const address = String(req.ip);
    const now = Date.now();
    const bad = this.badTokens.add(address, 0, now);
    const all = this.requests.add(address, 1, now);
    const refuse = (w: Window, why: string) => {
      res.setHeader('Retry-After', String(Math.max(1, Math.ceil((w.resetAt - now) / 1000))));
      throw new HttpException(why, HttpStatus.TOO_MANY_REQUESTS);
    };
    if (bad.count >= PORTAL_BAD_TOKENS_PER_WINDOW) {
      refuse(
        bad,
        'Too many links that are not valid were tried from your address. Wait ten minutes and open the link from the e-mail again.',
      );
    }
    if (all.count > PORTAL_REQUESTS_PER_MINUTE) {
      refuse(all, 'Too many requests from your address. Wait a minute and try again.');
    }
    return next.handle().pipe(
      catchError((e: unknown) => {
        if (e instanceof UnknownLinkError) this.badTokens.add(address, 1);
        throw e;
      }),
    );
  }

  /** Forgets every address (tests). */
  reset(): void {
    this.requests.clear();
    this.badTokens.clear();
  }
}
