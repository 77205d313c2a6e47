import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, apiRequest } from '@/lib/api-client';

function respond(status: number, body?: unknown, statusText = ''): Response {
  const text = body === undefined ? null : typeof body === 'string' ? body : JSON.stringify(body);
  return new Response(text, {
    status,
    statusText,
    headers: { 'Content-Type': 'application/json' },
  });
}

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

describe('apiRequest', () => {
  it('sends credentials and JSON to /api and returns the parsed body', async () => {
    fetchMock.mockResolvedValueOnce(respond(200, { id: 1 }));
    await expect(api.post('/users', { name: 'Ana' })).resolves.toEqual({ id: 1 });
    const [url, init] = fetchMock.mock.calls[0]!;
    expect(url).toBe('/api/users');
    expect(init).toMatchObject({ method: 'POST', credentials: 'include', body: '{"name":"Ana"}' });
    expect(init?.headers).toMatchObject({ 'Content-Type': 'application/json' });
  });

  it('returns undefined for 204 No Content', async () => {
    fetchMock.mockResolvedValueOnce(new Response(null, { status: 204 }));
    await expect(api.post<void>('/auth/logout')).resolves.toBeUndefined();
  });

  it('does not follow redirects itself or send a body on GET', async () => {
    fetchMock.mockResolvedValueOnce(respond(200, []));
    await apiRequest('/users');
    const init = fetchMock.mock.calls[0]![1];
    expect(init?.method).toBe('GET');
    expect(init?.body).toBeUndefined();
  });

  it('throws a typed ApiError with status and the server body', async () => {
    const body = {
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is not correct.',
      errors: [{ field: null, message: 'E-mail or password is not correct.' }],
      path: '/api/auth/login',
      requestId: 'req-1',
    };
    fetchMock.mockResolvedValueOnce(respond(401, body));
    const error = await api.post('/auth/login', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(401);
    expect(apiError.body).toEqual(body);
    expect(apiError.message).toBe('E-mail or password is not correct.');
    expect(apiError.requestId).toBe('req-1');
  });

  it('keeps a list of field messages', async () => {
    const message = [
      'email must be an email',
      'password must be longer than or equal to 10 characters',
    ];
    fetchMock.mockResolvedValueOnce(
      respond(400, {
        statusCode: 400,
        error: 'Bad Request',
        message,
        errors: [
          { field: 'email', message: message[0] },
          { field: 'password', message: message[1] },
        ],
        path: '/api/users',
        requestId: 'r',
      }),
    );
    const error = (await api.post('/users', {}).catch((e: unknown) => e)) as ApiError;
    expect(error.status).toBe(400);
    expect(error.messages).toEqual(message);
    expect(error.message).toBe(message.join('; '));
  });

  it('copes with a body that is not the server error shape', async () => {
    fetchMock.mockResolvedValueOnce(respond(502, '<html>Bad gateway</html>', 'Bad Gateway'));
    const error = (await api.get('/health').catch((e: unknown) => e)) as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(502);
    expect(error.body).toBeNull();
    expect(error.message).toBe('Bad Gateway');
  });
});
