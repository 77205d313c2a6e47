import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

const apiError = (status: number) =>
  new ApiError(
    status,
    { statusCode: status, error: 'x', message: `failed ${status}`, path: '/', requestId: 'r' },
    '',
  );

describe('query client error hooks', () => {
  it('reports a 401 as an ended session and does not toast it', async () => {
    const onUnauthorized = vi.fn();
    const client = createQueryClient({ onUnauthorized });
    const before = toasts.snapshot().length;
    await client
      .fetchQuery({ queryKey: ['x'], queryFn: () => Promise.reject(apiError(401)) })
      .catch(() => {});
    expect(onUnauthorized).toHaveBeenCalledWith(client);
    expect(toasts.snapshot()).toHaveLength(before);
  });

  it('ignores a 401 from a call marked ignoreUnauthorized (the login)', async () => {
    const onUnauthorized = vi.fn();
    const client = createQueryClient({ onUnauthorized });
    const mutation = client.getMutationCache().build(client, {
      mutationFn: () => Promise.reject(apiError(401)),
      meta: { ignoreUnauthorized: true, inlineErrors: true },
    });
    await mutation.execute(undefined).catch(() => {});
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('toasts other errors with the server message', async () => {
    const client = createQueryClient({ onUnauthorized: vi.fn() });
    await client
      .fetchQuery({ queryKey: ['y'], queryFn: () => Promise.reject(apiError(403)) })
      .catch(() => {});
    expect(toasts.snapshot().at(-1)).toMatchObject({ message: 'failed 403', severity: 'error' });
  });
});
