import { Injectable, type OnApplicationBootstrap } from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';

/**
 * Whether the parameter route `param` would take the requests of the literal route
 * `literal`: as many segments, the same literals, and a parameter (`:id`) where the other
 * has a literal (`/lots/:id` takes `/lots/export.csv`).
 */
export function shadows(param: string, literal: string): boolean {
  const p = param.split('/');
  const l = literal.split('/');
  if (p.length !== l.length) return false;
  let taken = false;
  for (let i = 0; i < p.length; i++) {
    if (p[i] === l[i]) continue;
    if (!p[i].startsWith(':') || l[i].startsWith(':') || l[i].includes('*')) return false;
    taken = true;
  }
  return taken;
}

interface RouterLayer {
  route?: { path?: unknown; methods?: Record<string, boolean> };
}

/** A controller's route: one method, one path (Nest's middleware are routes of every method). */
function handlerPath(layer: RouterLayer | undefined): string | null {
  const route = layer?.route;
  if (typeof route?.path !== 'string') return null;
  return Object.keys(route.methods ?? {}).length === 1 ? route.path : null;
}

/**
 * Moves each literal route before the parameter routes that would take its requests,
 * within each run of consecutive controller routes; every other layer keeps its place and
 * order. Express tries routes in the order they were added, and Nest adds them module by
 * module: without this, `GET /lots/:id` (the lot page's module) answered
 * `/lots/export.csv` with a 400 whenever its module came before the lots module.
 */
export function literalRoutesFirst(stack: RouterLayer[]): void {
  let start = 0;
  while (start < stack.length) {
    let end = start;
    while (handlerPath(stack[end]) !== null) end++;
    for (let i = start; i < end; i++) {
      const param = handlerPath(stack[i]) as string;
      for (let j = i + 1; j < end; j++) {
        if (!shadows(param, handlerPath(stack[j]) as string)) continue;
        const [literal] = stack.splice(j, 1);
        stack.splice(i, 0, literal);
        i++; // the parameter route moved one down
      }
    }
    start = end + 1;
  }
}

/**
 * Makes route order independent of module order: once every module has added its routes
 * (and before the server listens), a literal path (`/lots/export.csv`,
 * `/returns/unreturned-lots`) comes before any parameter route beside it, whatever order
 * AppModule lists its modules in.
 */
@Injectable()
export class RouteOrder implements OnApplicationBootstrap {
  constructor(private readonly host: HttpAdapterHost) {}

  onApplicationBootstrap(): void {
    const express = this.host.httpAdapter.getInstance() as { router?: { stack: RouterLayer[] } };
    if (express.router) literalRoutesFirst(express.router.stack);
  }
}
