import type { INestApplication } from '@nestjs/common';
import { openApiComponents } from '@gaugeproof/api-types/schemas';
import { Ajv, type ValidateFunction } from 'ajv';
import addFormatsModule from 'ajv-formats';
// ajv-formats is CommonJS with a default export.
const addFormats =
  (addFormatsModule as unknown as { default?: typeof addFormatsModule }).default ??
  addFormatsModule;
import type { NextFunction, Request, Response } from 'express';
import { buildOpenApiDocument } from '../../src/common/answers';

interface Operation {
  responses?: Record<string, { content?: Record<string, { schema?: object }> }>;
}

/**
 * Checks every JSON answer of a test app against the OpenAPI document: the route must
 * describe a response for the status it answered, and the body must match its schema (no
 * field the document does not name, none it names missing, every value of its type).
 * Installed by startTestApp before the routes; `problems` lists what did not match, and the
 * app's close() fails the test file when any did.
 */
export function contractCheck(app: INestApplication) {
  const problems: string[] = [];
  let routes: { method: string; pattern: RegExp; path: string; op: Operation }[] | null = null;
  const validators = new Map<string, ValidateFunction>();
  let ajv: Ajv | null = null;

  const load = () => {
    const doc = buildOpenApiDocument(app, openApiComponents());
    ajv = new Ajv({ allErrors: false, strict: false, verbose: true });
    addFormats(ajv);
    ajv.addSchema({ components: jsonSchemaOf(doc.components) }, 'doc');
    routes = [];
    for (const [path, ops] of Object.entries(doc.paths)) {
      const pattern = new RegExp('^' + path.replace(/\{\w+\}/g, '[^/]+') + '$');
      for (const [method, op] of Object.entries(ops as Record<string, Operation>)) {
        routes.push({ method: method.toUpperCase(), pattern, path, op });
      }
    }
  };

  const check = (req: Request, status: number, body: string) => {
    if (!routes) load();
    const path = req.originalUrl.split('?')[0];
    // As the server routes it: a literal segment before a parameter (/lots/export.csv is
    // not /lots/{id}), whatever order the document lists its paths in.
    const route = routes!
      .filter((r) => r.method === req.method && r.pattern.test(path))
      .sort((a, b) => literalFirst(a.path, b.path))[0];
    if (!route) return; // not an API route (the client, the docs)
    const response = route.op.responses?.[String(status)];
    const schema = response?.content?.['application/json']?.schema;
    const where = `${req.method} ${route.path} ${status}`;
    if (!schema) {
      problems.push(`${where}: the document describes no JSON answer for this status`);
      return;
    }
    let v = validators.get(where);
    if (!v) {
      v = ajv!.compile({ $ref: `doc${(schema as { $ref: string }).$ref}` });
      validators.set(where, v);
    }
    if (!v(JSON.parse(body) as unknown)) {
      const e = v.errors?.[0];
      problems.push(
        `${where}: ${e?.instancePath || '(body)'} ${e?.message} ${JSON.stringify(e?.params)} (got ${JSON.stringify(e?.data)})`,
      );
    }
  };

  const middleware = (req: Request, res: Response, next: NextFunction) => {
    const send = res.send.bind(res);
    res.send = (body?: unknown) => {
      const type = String(res.getHeader('content-type') ?? '');
      if (
        res.statusCode >= 200 &&
        res.statusCode < 300 &&
        type.startsWith('application/json') &&
        (typeof body === 'string' || Buffer.isBuffer(body))
      ) {
        try {
          check(req, res.statusCode, body.toString());
        } catch (e) {
          problems.push(`${req.method} ${req.originalUrl}: ${(e as Error).message}`);
        }
      }
      return send(body);
    };
    next();
  };
  return { middleware, problems };
}

/**
 * OpenAPI 3.0's `nullable: true` as JSON Schema: null joins the type (or, beside a $ref or
 * a composition, an alternative of its own).
 */
function jsonSchemaOf(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(jsonSchemaOf);
  if (typeof node !== 'object' || node === null) return node;
  const { nullable, ...rest } = node as Record<string, unknown>;
  const out = Object.fromEntries(Object.entries(rest).map(([k, v]) => [k, jsonSchemaOf(v)]));
  if (nullable !== true) return out;
  if (typeof out.type === 'string') return { ...out, type: [out.type, 'null'] };
  return { anyOf: [out, { type: 'null' }] };
}

/** Two templates that match one path, the one with a literal at the first difference first. */
function literalFirst(a: string, b: string): number {
  const x = a.split('/');
  const y = b.split('/');
  for (let i = 0; i < x.length; i++) {
    const d = Number(x[i].startsWith('{')) - Number(y[i]?.startsWith('{'));
    if (d !== 0) return d;
  }
  return 0;
}
