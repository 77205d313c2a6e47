import {
  BadRequestException,
  Injectable,
  type ArgumentMetadata,
  type PipeTransform,
} from '@nestjs/common';

/** No request body of ours nests deeper than a handful of levels. */
export const MAX_BODY_DEPTH = 16;

/** Depth of a parsed JSON value, measured without recursion so no input can overflow it. */
export function jsonDepth(value: unknown, limit = Infinity): number {
  let max = 0;
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length > 0) {
    const [v, d] = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    const depth = d + 1;
    if (depth > max) max = depth;
    if (max > limit) return max;
    for (const child of Object.values(v as Record<string, unknown>)) stack.push([child, depth]);
  }
  return max;
}

/**
 * Refuses bodies nested deeper than MAX_BODY_DEPTH before validation runs: class-transformer
 * recurses per level and would overflow the stack on a deep enough document. A global pipe
 * placed before the ValidationPipe, so it sees exactly the bodies class-transformer would
 * (a global interceptor did the same on every request, GETs included, at a few per cent of
 * a lot-list request).
 */
@Injectable()
export class BodyDepthPipe implements PipeTransform {
  transform(value: unknown, meta: ArgumentMetadata): unknown {
    if (meta.type === 'body' && jsonDepth(value, MAX_BODY_DEPTH) > MAX_BODY_DEPTH) {
      throw new BadRequestException(
        `Request body is nested too deeply (more than ${MAX_BODY_DEPTH} levels)`,
      );
    }
    return value;
  }
}
