import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { LotTimeline, RECENT_EVENTS } from '@/features/audit/components/lot-timeline';
import type { TimelineEvent } from '@/features/audit/types';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const event = (i: number): TimelineEvent => ({
  id: i,
  at: new Date(Date.UTC(2026, 10, 1, 8, i)).toISOString(),
  actor: { id: 1, name: 'Rosa Okafor' },
  actorEmail: 'clerk@demo.example',
  action: 'reading.create',
  entityType: 'reading',
  entityId: i,
  lotId: 1,
  summary: `Event number ${i}`,
  before: null,
  after: null,
});

function renderTimeline(count: number) {
  const events = Array.from({ length: count }, (_, i) => event(i + 1));
  fetchMock.mockImplementation(
    async () =>
      new Response(JSON.stringify(events), {
        status: 200,
        headers: { 'Content-Type': 'application/json' },
      }),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <LotTimeline lotId={7} />
    </QueryClientProvider>,
  );
  return userEvent.setup({ delay: null });
}

const shown = () =>
  within(screen.getByRole('list', { name: 'Lot events' }))
    .getAllByRole('listitem')
    .map((li) => li.querySelector('p')?.textContent);

describe('LotTimeline', () => {
  it('shows the latest events, oldest first, and the earlier ones on request', async () => {
    const user = renderTimeline(RECENT_EVENTS + 5);
    const more = await screen.findByRole('button', { name: 'Show the 5 earlier events' });
    expect(shown()).toHaveLength(RECENT_EVENTS);
    expect(shown()[0]).toBe('Event number 6');
    expect(shown().at(-1)).toBe(`Event number ${RECENT_EVENTS + 5}`);
    await user.click(more);
    expect(shown()).toHaveLength(RECENT_EVENTS + 5);
    expect(shown()[0]).toBe('Event number 1');
    expect(screen.queryByRole('button', { name: /earlier/ })).not.toBeInTheDocument();
  });

  it('shows a short timeline whole, with no button', async () => {
    renderTimeline(3);
    await screen.findByText('Event number 3');
    expect(shown()).toHaveLength(3);
    expect(screen.queryByRole('button', { name: /earlier/ })).not.toBeInTheDocument();
  });
});
