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
import type { Request } from 'express';
import { APP_CONFIG } from '../config/config.module';
import type { AppConfig } from '../config/env';
import { IS_PUBLIC, ROLES_KEY } from './decorators';
import type { Role } from './roles';
import { SESSION_COOKIE, type JwtClaims, type RequestUser } from './request-user';
import { SignedInUsers } from './signed-in-users';

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
