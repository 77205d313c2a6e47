import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { UsersPanel } from '@/features/users/components/users-panel';
import type { User } from '@/features/users/types';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

const people: User[] = [
  {
    id: 1,
    email: 'admin@demo.example',
    name: 'Demo Admin',
    role: 'admin',
    active: true,
    createdAt: '2026-01-05T08:00:00Z',
    version: 1,
  },
  {
    id: 2,
    email: 'clerk@demo.example',
    name: 'Demo Clerk',
    role: 'clerk',
    active: false,
    createdAt: '2026-01-06T08:00:00Z',
    version: 4,
  },
];

function renderPanel() {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  render(
    <QueryClientProvider client={client}>
      <UsersPanel currentUserId={1} />
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('UsersPanel', () => {
  it('lists users with role and status; one cannot deactivate oneself', async () => {
    fetchMock.mockResolvedValueOnce(json(200, people));
    renderPanel();
    const adminRow = (await screen.findByRole('cell', { name: 'admin@demo.example' })).closest(
      'tr',
    )!;
    expect(within(adminRow).getByText('Administrator')).toBeInTheDocument();
    expect(within(adminRow).getByRole('button', { name: 'Deactivate' })).toBeDisabled();
    const clerkRow = screen.getByRole('cell', { name: 'clerk@demo.example' }).closest('tr')!;
    expect(within(clerkRow).getByText('Inactive')).toBeInTheDocument();
    expect(within(clerkRow).getByRole('button', { name: 'Activate' })).toBeEnabled();
  });

  it('says so when there are no users', async () => {
    fetchMock.mockResolvedValueOnce(json(200, []));
    renderPanel();
    expect(await screen.findByText(/No users yet/)).toBeInTheDocument();
  });

  it('shows the error and offers to try again', async () => {
    fetchMock.mockResolvedValueOnce(
      json(403, {
        statusCode: 403,
        error: 'Forbidden',
        message: 'Not allowed',
        path: '/api/users',
        requestId: 'r',
      }),
    );
    renderPanel();
    expect(await screen.findByText(/could not be loaded: Not allowed/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('activates a user with a PATCH of active only, on the version it was listed at', async () => {
    fetchMock.mockResolvedValueOnce(json(200, people));
    const user = renderPanel();
    const clerkRow = (await screen.findByRole('cell', { name: 'clerk@demo.example' })).closest(
      'tr',
    )!;
    fetchMock.mockResolvedValueOnce(json(200, { ...people[1], active: true }));
    fetchMock.mockResolvedValueOnce(json(200, people));
    await user.click(within(clerkRow).getByRole('button', { name: 'Activate' }));
    const [url, init] = fetchMock.mock.calls[1]!;
    expect(url).toBe('/api/users/2');
    expect(init).toMatchObject({ method: 'PATCH', body: '{"version":4,"active":true}' });
  });

  it('keeps the edit when another admin saved first, and loads their version on request', async () => {
    fetchMock.mockResolvedValueOnce(json(200, people));
    const user = renderPanel();
    const clerkRow = (await screen.findByRole('cell', { name: 'clerk@demo.example' })).closest(
      'tr',
    )!;
    await user.click(within(clerkRow).getByRole('button', { name: 'Edit' }));
    const dialog = screen.getByRole('dialog');
    const name = within(dialog).getByLabelText('Name');
    await user.clear(name);
    await user.type(name, 'Clerk Renamed Here');
    const theirs = { ...people[1], name: 'Clerk Renamed There', role: 'qa_lead', version: 5 };
    fetchMock.mockResolvedValueOnce(
      json(409, {
        statusCode: 409,
        error: 'Conflict',
        message: 'Someone else saved the account of clerk@demo.example after you opened it',
        current: theirs,
        path: '/api/users/2',
        requestId: 'r',
      }),
    );
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));
    expect(
      await within(dialog).findByText('Someone else saved this account while you were editing'),
    ).toBeInTheDocument();
    const [, init] = fetchMock.mock.calls[1]!;
    expect(init).toMatchObject({
      method: 'PATCH',
      body: '{"version":4,"name":"Clerk Renamed Here"}',
    });
    // The admin's typing is still there until they choose.
    expect(name).toHaveValue('Clerk Renamed Here');
    await user.click(within(dialog).getByRole('button', { name: 'Load their version' }));
    expect(name).toHaveValue('Clerk Renamed There');
    expect(within(dialog).queryByText(/Someone else saved/)).not.toBeInTheDocument();
  });

  it('validates the new-user form as you type and shows server field errors', async () => {
    fetchMock.mockResolvedValueOnce(json(200, people));
    const user = renderPanel();
    await user.click(await screen.findByRole('button', { name: 'New user' }));
    const dialog = screen.getByRole('dialog');
    await user.type(within(dialog).getByLabelText('Password'), 'short');
    expect(await within(dialog).findByText('At least 10 characters.')).toBeInTheDocument();

    await user.type(within(dialog).getByLabelText('E-mail'), 'new@demo.example');
    await user.type(within(dialog).getByLabelText('Name'), 'New Person');
    await user.type(within(dialog).getByLabelText('Password'), '-and-longer');
    fetchMock.mockResolvedValueOnce(
      json(400, {
        statusCode: 400,
        error: 'Bad Request',
        message: ['email address is already in use'],
        path: '/api/users',
        requestId: 'r',
      }),
    );
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));
    expect(await within(dialog).findByText('email address is already in use')).toBeInTheDocument();
  });
});
