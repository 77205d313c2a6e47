import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SignInForm } from '@/features/auth/components/sign-in-form';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

function renderForm(onSignedIn = vi.fn()) {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <SignInForm onSignedIn={onSignedIn} />
    </QueryClientProvider>,
  );
  return { onSignedIn, user: userEvent.setup() };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const errorBody = (statusCode: number, message: string) => ({
  statusCode,
  error: 'x',
  message,
  path: '/api/auth/login',
  requestId: 'r',
});

describe('SignInForm', () => {
  it('asks for both fields and sends nothing when they are empty', async () => {
    const { user } = renderForm();
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('rejects a malformed e-mail address', async () => {
    const { user } = renderForm();
    await user.type(screen.getByLabelText('E-mail'), 'clerk-at-demo');
    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter a valid e-mail address.')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('signs in and hands over the user', async () => {
    const account = { id: 1, email: 'clerk@demo.example', name: 'Demo Clerk', role: 'clerk' };
    fetchMock.mockResolvedValueOnce(json(200, { accessToken: 't', user: account }));
    const { user, onSignedIn } = renderForm();
    await user.type(screen.getByLabelText('E-mail'), ' clerk@demo.example ');
    await user.type(screen.getByLabelText('Password'), 'gaugeproof-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(account));
    const body = JSON.parse(String(fetchMock.mock.calls[0]![1]?.body)) as unknown;
    expect(body).toEqual({ email: 'clerk@demo.example', password: 'gaugeproof-demo' });
  });

  it.each([
    [401, 'Invalid e-mail or password.'],
    [429, 'Too many attempts. Wait a minute and try again.'],
  ])('shows the server message for %i without blaming a field', async (status, message) => {
    fetchMock.mockResolvedValueOnce(json(status, errorBody(status, message)));
    const { user, onSignedIn } = renderForm();
    await user.type(screen.getByLabelText('E-mail'), 'clerk@demo.example');
    await user.type(screen.getByLabelText('Password'), 'wrong-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
    expect(screen.getByLabelText('E-mail')).not.toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('Password')).not.toHaveAttribute('aria-invalid', 'true');
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});
