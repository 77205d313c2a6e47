import type { ErrorBody } from '@gaugeproof/api-types';

/**
 * The server's error body: the contract's `ErrorBody` (libs/api-types), which the one
 * exception filter gives every error: `message`, and `errors: [{field, message}]` naming the
 * request field each problem is about (null when none). What a rule adds beside it (`current`
 * on a stale edit's 409) is read where it is needed.
 */
export type ApiErrorBody = ErrorBody;

/**
 * The body as the contract's ErrorBody, or null when the server (or a proxy) sent another.
 * A body without its `errors` list gets one as the server's filter makes it for a problem
 * that names no field: each message with field null.
 */
export function errorBodyOf(value: unknown): ApiErrorBody | null {
  if (typeof value !== 'object' || value === null) return null;
  const body = value as Record<string, unknown>;
  const message = body.message;
  if (
    typeof body.statusCode !== 'number' ||
    !(
      typeof message === 'string' ||
      (Array.isArray(message) && message.every((m) => typeof m === 'string'))
    )
  )
    return null;
  const listed = body.errors;
  if (Array.isArray(listed) && listed.every(isProblem)) return value as ApiErrorBody;
  const errors = [message].flat().map((m) => ({ field: null, message: m }));
  return { ...(value as Omit<ApiErrorBody, 'errors'>), errors };
}

const isProblem = (e: unknown) =>
  typeof e === 'object' && e !== null && typeof (e as { message?: unknown }).message === 'string';

export class ApiError extends Error {
  readonly status: number;
  /** The parsed error body, or null when the server sent something else. */
  readonly body: ApiErrorBody | null;

  constructor(status: number, body: ApiErrorBody | null, fallbackMessage: string) {
    const messages = body ? [body.message].flat() : [];
    super(messages.length > 0 ? messages.join('; ') : fallbackMessage);
    this.name = 'ApiError';
    this.status = status;
    this.body = body;
  }

  /** Every message the server gave, one per field problem when it sent a list. */
  get messages(): string[] {
    return this.body ? [this.body.message].flat() : [this.message];
  }

  get requestId(): string | undefined {
    return this.body?.requestId;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/** An answer's text as JSON, the text itself when it is none, undefined when empty. */
export function parseAnswer(text: string): unknown {
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/** The ApiError of a non-2xx answer read outside apiRequest (uploads with their own transport). */
export const apiErrorOf = (status: number, body: unknown, fallbackMessage: string) =>
  new ApiError(status, errorBodyOf(body), fallbackMessage);

/**
 * The one way the client talks to the server. It sends the session cookie, speaks
 * JSON and throws an ApiError for any non-2xx answer. It never redirects or shows
 * anything itself: the query client's error hooks decide that.
 */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';

  const response = await fetch(`/api${path}`, {
    method: options.method ?? 'GET',
    credentials: 'include',
    headers,
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
    signal: options.signal,
  });

  if (response.status === 204) return undefined as T;
  const body = parseAnswer(await response.text());
  if (!response.ok) {
    const fallback = response.statusText || `Request failed with status ${response.status}`;
    throw apiErrorOf(response.status, body, fallback);
  }
  return body as T;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
};
