import type { Response } from 'supertest';
import type { TestApp } from './test-app';

type Method = 'get' | 'post' | 'patch';

/** Calls the API as a demo user (bearer token), sending `body` as JSON. */
export async function call(
  t: TestApp,
  email: string,
  method: Method,
  path: string,
  body?: object,
): Promise<Response> {
  const req = t.http[method](path).set('Authorization', `Bearer ${await t.token(email)}`);
  return body === undefined ? req : req.send(body);
}

/** A calendar date `days` from today (UTC), as the server counts them. */
export function dayFromToday(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

/** The header that signs a request in with a bearer token. */
export const auth = (token: string) => ({ Authorization: `Bearer ${token}` });
