import type { INestApplication } from '@nestjs/common';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import { IS_PUBLIC, ROLES_KEY } from '../../src/auth/decorators';
import { answerOf, type Answer } from '../../src/common/answers';
import type { Role } from '../../src/auth/roles';

export interface RouteInfo {
  method: string;
  path: string;
  controller: string;
  handler: string;
  isPublic: boolean;
  roles: Role[] | undefined;
  /** What the route answers (`@Answers`), if it names it. */
  answer: Answer | undefined;
}

/** Every route the Nest router knows, with what it declares about access. */
export function listRoutes(app: INestApplication): RouteInfo[] {
  const discovery = app.get(DiscoveryService);
  const scanner = app.get(MetadataScanner);
  const reflector = app.get(Reflector);
  const routes: RouteInfo[] = [];
  for (const wrapper of discovery.getControllers()) {
    const instance = wrapper.instance as Record<string, unknown> | undefined;
    if (!instance || !wrapper.metatype) continue;
    const cls = wrapper.metatype;
    const base = String(Reflect.getMetadata(PATH_METADATA, cls) ?? '');
    const proto = Object.getPrototypeOf(instance) as object;
    for (const name of scanner.getAllMethodNames(proto)) {
      const fn = (proto as Record<string, unknown>)[name] as () => unknown;
      const sub = Reflect.getMetadata(PATH_METADATA, fn) as string | undefined;
      if (sub === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, fn) as number];
      const path = `/api/${[base, sub].filter((p) => p && p !== '/').join('/')}`.replace(
        /\/+/g,
        '/',
      );
      routes.push({
        method,
        path,
        controller: cls.name,
        handler: name,
        isPublic: reflector.getAllAndOverride<boolean>(IS_PUBLIC, [fn, cls]) === true,
        roles: reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [fn, cls]),
        answer: answerOf(fn),
      });
    }
  }
  return routes;
}
