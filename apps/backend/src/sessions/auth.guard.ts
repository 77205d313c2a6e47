import {
  CanActivate,
  ExecutionContext,
  ForbiddenException,
  Inject,
  Injectable,
  UnauthorizedException,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { JwtService } from '@nestjs/jwt';
import type { Request, Response } from 'express';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { IS_PUBLIC, ROLES_KEY } from '../auth/decorators';
import type { Role } from '../auth/roles';
import {
  SESSION_COOKIE,
  SESSION_HOURS,
  SESSION_IDLE_MINUTES,
  SESSION_REFRESH_SECONDS,
  type JwtClaims,
  type RequestUser,
} from '../auth/request-user';
import { signSession } from './session-tokens';
import { SignedInUsers } from './signed-in-users';

/** The renewed token of a session in use, for clients that send it as a bearer token. */
export const SESSION_TOKEN_HEADER = 'X-Session-Token';

const MUTATING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Deny by default: every route needs a signed-in, active user with a declared role,
 * unless marked @Public(). Cookie-authenticated writes must come from the app's own origin.
 */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly jwt: JwtService,
    private readonly users: SignedInUsers,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async canActivate(ctx: ExecutionContext): Promise<boolean> {
    const targets = [ctx.getHandler(), ctx.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    const req = ctx.switchToHttp().getRequest<Request & { user?: RequestUser }>();

    const bearer = /^Bearer (.+)$/i.exec(req.headers.authorization ?? '')?.[1];
    const cookies = req.cookies as Record<string, string> | undefined;
    const token = bearer ?? cookies?.[SESSION_COOKIE];
    if (!token) throw new UnauthorizedException('Sign in to continue');
    let claims: JwtClaims;
    try {
      claims = await this.jwt.verifyAsync<JwtClaims>(token);
    } catch {
      throw new UnauthorizedException('Your session has ended; sign in again');
    }
    const user = await this.users.byId(claims.sub);
    if (!user || !user.active) throw new UnauthorizedException('This account cannot sign in');
    // Signed out, password changed, role changed or deactivated since: this session is over.
    if (claims.sv !== user.sessionVersion || typeof claims.auth !== 'number') {
      throw new UnauthorizedException('Your session has ended; sign in again');
    }
    await this.renew(ctx.switchToHttp().getResponse<Response>(), claims, user, !bearer, req);
    if (!bearer && MUTATING.has(req.method) && !this.sameOrigin(req)) {
      throw new ForbiddenException('Request refused: it did not come from Gaugeproof itself');
    }
    req.user = { id: user.id, email: user.email, name: user.name, role: user.role };
    if (!roles) throw new ForbiddenException('This route declares no roles');
    if (user.role !== 'admin' && !roles.includes(user.role)) {
      throw new ForbiddenException('Your role cannot do this');
    }
    return true;
  }

  /**
   * A session in use stays open: once its token is SESSION_REFRESH_SECONDS old it gets a new
   * one (the cookie, and the X-Session-Token header for bearer clients), still ending
   * SESSION_HOURS after sign-in. One left alone ends SESSION_IDLE_MINUTES after its last use.
   */
  private async renew(
    res: Response,
    claims: JwtClaims,
    user: { id: number; role: JwtClaims['role']; sessionVersion: number },
    cookie: boolean,
    req: Request,
  ) {
    const now = Math.floor(Date.now() / 1000);
    if (now - (claims.iat ?? 0) < SESSION_REFRESH_SECONDS) return;
    const token = await signSession(this.jwt, user, claims.auth);
    res.setHeader(SESSION_TOKEN_HEADER, token);
    if (cookie) {
      const left = Math.min(SESSION_IDLE_MINUTES * 60, claims.auth + SESSION_HOURS * 3600 - now);
      res.cookie(SESSION_COOKIE, token, {
        httpOnly: true,
        sameSite: 'strict',
        secure: req.secure,
        path: '/',
        maxAge: Math.max(0, left) * 1000,
      });
    }
  }

  private sameOrigin(req: Request): boolean {
    const origin = req.headers.origin;
    if (!origin) return false;
    if (this.config.appOrigins.includes(origin) || origin === this.config.publicUrl) return true;
    try {
      return new URL(origin).host === req.headers.host;
    } catch {
      return false;
    }
  }
}
