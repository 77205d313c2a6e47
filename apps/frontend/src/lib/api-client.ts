/** The server's error body (one exception filter shapes every error this way). */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string | string[];
  path: string;
  requestId: string;
  /** Each problem with the request field it is about (null when it names none). */
  errors?: { field?: string | null; message: string }[];
}

function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null) return false;
  const body = value as Record<string, unknown>;
  const message = body.message;
  return (
    typeof body.statusCode === 'number' &&
    (typeof message === 'string' ||
      (Array.isArray(message) && message.every((m) => typeof m === 'string')))
  );
}

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

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

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
  const body = await readBody(response);
  if (!response.ok) {
    const fallback = response.statusText || `Request failed with status ${response.status}`;
    throw new ApiError(response.status, isApiErrorBody(body) ? body : null, fallback);
  }
  return body as T;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>(path, { method: 'PATCH', body }),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
};
