import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { toasts } from '@/lib/toast-store';

const apiError = (status: number) =>
  new ApiError(
    status,
    {
      statusCode: status,
      error: 'x',
      message: `failed ${status}`,
      errors: [{ field: null, message: `failed ${status}` }],
      path: '/',
      requestId: 'r',
    },
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

  it('leaves a first-load error to the screen but toasts a failed refresh', async () => {
    const client = createQueryClient({ onUnauthorized: vi.fn() });
    const before = toasts.snapshot().length;
    const fail = () => Promise.reject(apiError(403));
    await client.fetchQuery({ queryKey: ['y'], queryFn: fail }).catch(() => {});
    expect(toasts.snapshot()).toHaveLength(before);

    client.setQueryData(['z'], 'on screen');
    await client.fetchQuery({ queryKey: ['z'], queryFn: fail, staleTime: 0 }).catch(() => {});
    expect(toasts.snapshot().at(-1)).toMatchObject({ message: 'failed 403', severity: 'error' });
  });

  it('toasts a failed mutation unless the form shows it inline', async () => {
    const client = createQueryClient({ onUnauthorized: vi.fn() });
    const run = (meta?: { inlineErrors: boolean }) =>
      client
        .getMutationCache()
        .build(client, { mutationFn: () => Promise.reject(apiError(409)), meta })
        .execute(undefined)
        .catch(() => {});
    const before = toasts.snapshot().length;
    await run({ inlineErrors: true });
    expect(toasts.snapshot()).toHaveLength(before);
    await run();
    expect(toasts.snapshot()).toHaveLength(before + 1);
  });
});
