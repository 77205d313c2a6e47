import type { LoggerService } from '@nestjs/common';

/**
 * Nest's own start-up chatter: one line per module, about a hundred "Mapped {…} route"
 * lines. At `info` they buried the one line a newcomer needs, so they go out at `debug`
 * (`LOG_LEVEL=debug` shows them again); everything else passes through unchanged.
 */
const BOOT_CONTEXTS = new Set([
  'NestFactory',
  'InstanceLoader',
  'RoutesResolver',
  'RouterExplorer',
  'NestApplication',
]);

export class BootQuietLogger implements LoggerService {
  constructor(private readonly inner: LoggerService) {}

  log(message: unknown, ...rest: unknown[]): void {
    const context = rest[rest.length - 1];
    if (typeof context === 'string' && BOOT_CONTEXTS.has(context) && this.inner.debug) {
      this.inner.debug(message, ...rest);
    } else {
      this.inner.log(message, ...rest);
    }
  }

  error(message: unknown, ...rest: unknown[]): void {
    this.inner.error(message, ...rest);
  }

  warn(message: unknown, ...rest: unknown[]): void {
    this.inner.warn(message, ...rest);
  }

  debug(message: unknown, ...rest: unknown[]): void {
    this.inner.debug?.(message, ...rest);
  }

  verbose(message: unknown, ...rest: unknown[]): void {
    this.inner.verbose?.(message, ...rest);
  }

  fatal(message: unknown, ...rest: unknown[]): void {
    (this.inner.fatal ?? this.inner.error).call(this.inner, message, ...rest);
  }
}
