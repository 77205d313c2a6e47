import { createParamDecorator, ExecutionContext, SetMetadata } from '@nestjs/common';
import type { Role } from './roles';
import type { RequestUser } from './request-user';

export const IS_PUBLIC = 'gaugeproof:public';
export const ROLES_KEY = 'gaugeproof:roles';

/** A route anyone may call without signing in (sign-in itself, health). */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/** The roles that may call a route; admin may always. Every non-public route must declare. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);

/** The signed-in user of the request. */
export const CurrentUser = createParamDecorator(
  (_data: unknown, ctx: ExecutionContext): RequestUser =>
    ctx.switchToHttp().getRequest<{ user: RequestUser }>().user,
);
