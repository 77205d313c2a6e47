import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DecisionPanel } from '@/features/decisions/components/decision-panel';
import type { DecidableLot } from '@/features/decisions/types';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

const lot: DecidableLot = {
  id: 7,
  status: 'awaiting_decision',
  version: 3,
  quantity: 200,
  unit: 'kits',
  ncrNumber: null,
  evaluation: {
    samplesPlanned: 5,
    samplesTested: 5,
    nonconforming: 0,
    inconclusive: 0,
    recommendation: 'accept',
    message: '0 of 5 units nonconforming; accept ≤ 0.',
  },
};

function renderPanel() {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  // The decision history reads the lot detail.
  fetchMock.mockImplementation(async (input) =>
    String(input) === '/api/lots/7'
      ? json(200, { id: 7, decisions: [] })
      : String(input) === '/api/lots/7/concessions'
        ? json(200, [])
        : json(500, {}),
  );
  render(
    <QueryClientProvider client={client}>
      <DecisionPanel lot={lot} meId={2} />
    </QueryClientProvider>,
  );
  return userEvent.setup({ delay: null });
}

const posts = () => fetchMock.mock.calls.filter(([, init]) => init?.method === 'POST');

describe('DecisionPanel', () => {
  it('needs no reason when following the recommendation, and sends the lot version', async () => {
    const user = renderPanel();
    expect(screen.getByRole('radio', { name: 'Accept (recommended)' })).toBeChecked();
    expect(screen.getByLabelText('Reason (optional)')).toBeInTheDocument();
    await screen.findByText('No decision yet.');
    fetchMock.mockResolvedValueOnce(
      json(201, {
        decision: {},
        lot: { id: 7, status: 'accepted', version: 4 },
        ncrNumber: null,
        switching: {
          from: 'normal',
          to: 'normal',
          changed: false,
          reducedAvailable: false,
          message: 'Inspection stays normal.',
        },
      }),
    );
    await user.click(screen.getByRole('button', { name: 'Record the decision' }));
    await screen.findByText('Inspection stays normal.');
    const [url, init] = posts()[0]!;
    expect(url).toBe('/api/lots/7/decisions');
    expect(JSON.parse(String(init?.body))).toEqual({ outcome: 'accept', reason: '', version: 3 });
  });

  it('asks for 20 characters against the recommendation, counting as one types', async () => {
    const user = renderPanel();
    await user.click(screen.getByRole('radio', { name: 'Reject' }));
    const reason = screen.getByLabelText(/Reason \(required\)/);
    expect(
      screen.getByText(/goes against the recommendation \(accept\): give a reason: 0 \/ 20/),
    ).toBeInTheDocument();
    await user.click(reason);
    await user.paste('too thin');
    expect(await screen.findByText(/at least 20 characters \(8 so far\)/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Record the decision' }));
    expect(posts()).toHaveLength(0);
    await user.paste(' on power, 8 AWG copper');
    expect(screen.queryByText(/so far/)).not.toBeInTheDocument();
  });

  it('shows who came first on a 409 and offers a reload', async () => {
    const user = renderPanel();
    fetchMock.mockResolvedValueOnce(
      json(409, {
        statusCode: 409,
        error: 'Conflict',
        message: 'Someone decided this lot first; review the current state and decide again',
        path: '/api/lots/7/decisions',
        requestId: 'r1',
        current: { id: 7, status: 'rejected', version: 4 },
      }),
    );
    await user.click(screen.getByRole('button', { name: 'Record the decision' }));
    expect(await screen.findByText('Someone decided this lot first')).toBeInTheDocument();
    expect(screen.getByText(/now rejected \(version 4\)/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Record the decision' })).not.toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();
  });
});
