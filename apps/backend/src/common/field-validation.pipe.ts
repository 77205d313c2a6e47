import { BadRequestException, HttpException, ValidationPipe } from '@nestjs/common';
import type { ValidationError } from 'class-validator';
import type { FieldError } from './domain-error';

/** Each constraint message with the path of its property (`conductors.0.gauge`), in Nest's order. */
function fieldErrors(errors: readonly ValidationError[], prefix = '', out: FieldError[] = []) {
  for (const e of errors) {
    const path = prefix ? `${prefix}.${e.property}` : e.property;
    if (e.children?.length) fieldErrors(e.children, path, out);
    for (const c of Object.values(e.constraints ?? {})) {
      out.push({ field: path, message: prefix ? `${prefix}.${c}` : c });
    }
  }
  return out;
}

/**
 * The global ValidationPipe, with its messages also given as data: `errors: [{field,
 * message}]`, the field being the property's path, so a client puts each on its form field
 * by name. `message` stays the list of sentences it always was.
 */
export class FieldValidationPipe extends ValidationPipe {
  override createExceptionFactory() {
    const nest = super.createExceptionFactory();
    return (validationErrors: ValidationError[] = []) => {
      const base = nest(validationErrors) as HttpException;
      const body = base.getResponse() as { message?: unknown };
      const messages = [body.message ?? []].flat().map(String);
      const byMessage = new Map<string, string>();
      for (const f of fieldErrors(validationErrors)) {
        if (f.field && !byMessage.has(f.message)) byMessage.set(f.message, f.field);
      }
      const errors = messages.map((m) => ({ field: byMessage.get(m) ?? null, message: m }));
      return new BadRequestException({ message: messages, errors });
    };
  }
}
