import type { TestApp } from './test-app';

interface SchemaObject {
  type?: string;
  properties?: Record<string, SchemaObject>;
  items?: SchemaObject;
  $ref?: string;
  enum?: unknown[];
}

interface OpenApiDoc {
  paths: Record<
    string,
    Record<string, { requestBody?: { content?: Record<string, { schema?: SchemaObject }> } }>
  >;
  components?: { schemas?: Record<string, SchemaObject> };
}

/** Field names each route's request body declares in the OpenAPI document, by "METHOD /path". */
export async function requestFields(t: TestApp): Promise<Map<string, string[]>> {
  const doc = (await t.http.get('/api/docs-json')).body as OpenApiDoc;
  const schemas = doc.components?.schemas ?? {};
  const resolve = (s: SchemaObject | undefined): SchemaObject | undefined =>
    s?.$ref ? schemas[s.$ref.split('/').pop() ?? ''] : s;
  const out = new Map<string, string[]>();
  for (const [path, ops] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(ops)) {
      const content = op.requestBody?.content ?? {};
      const schema = resolve(Object.values(content)[0]?.schema);
      const names = new Set<string>(Object.keys(schema?.properties ?? {}));
      for (const prop of Object.values(schema?.properties ?? {})) {
        const inner = resolve(prop.items ?? prop);
        for (const k of Object.keys(inner?.properties ?? {})) names.add(k);
      }
      const key = `${method.toUpperCase()} ${path.replace(/\{(\w+)\}/g, ':$1')}`;
      out.set(key, [...names]);
    }
  }
  return out;
}
