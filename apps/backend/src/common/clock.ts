import { Global, Module } from '@nestjs/common';
import { AsyncLocalStorage } from 'node:async_hooks';

/** The instant a `runAt` scope holds, in epoch milliseconds. */
const scope = new AsyncLocalStorage<number>();

/**
 * The application's one source of "now": every time the server stamps (audit events,
 * entities' created and updated times, a decision's, a return's or a SCAR's steps, a
 * reading's) is read here. It is the real time, unless the caller runs inside `runAt`,
 * which holds another instant for everything awaited within it (AsyncLocalStorage): the
 * demo seed tells its story that way, each step at the story's date, so rows and audit
 * events are right when written. Reading it costs one AsyncLocalStorage lookup.
 *
 * Parsing a value (`new Date(iso)`) is no clock read; only the present moment comes from
 * here. Timers, rate windows and token expiry keep the real time (they measure, they do
 * not stamp). Code outside Nest's container (entities' defaults, plain functions) uses
 * the exported `clock`, the same instance the container provides.
 */
export class Clock {
  /** Now, or the instant of the enclosing `runAt`. A new Date each call: callers may keep it. */
  now(): Date {
    return new Date(this.nowMs());
  }

  /** `now()` in epoch milliseconds. */
  nowMs(): number {
    return scope.getStore() ?? Date.now();
  }

  /** Runs `fn` with `now()` reading `at` for everything it does, awaited work included. */
  runAt<T>(at: Date, fn: () => T): T {
    return scope.run(at.getTime(), fn);
  }
}

export const clock = new Clock();

/** Provides the one `Clock` to every module (services may inject it). */
@Global()
@Module({ providers: [{ provide: Clock, useValue: clock }], exports: [Clock] })
export class ClockModule {}
