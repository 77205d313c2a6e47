import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { UnreturnedLot } from '@/features/returns/api/get-unreturned-lots';
import { UnreturnedLotsSection } from '@/features/returns/components/unreturned-lots-section';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const lot = (id: number, quantity: number, unit: string): UnreturnedLot => ({
  id,
  poNumber: `PO-${id}`,
  supplierLotCode: null,
  quantity,
  unit,
  receivedAt: '2026-11-02T08:00:00.000Z',
  rejectedAt: '2026-11-03T08:00:00.000Z',
  supplier: { id: 1, name: 'Brindle Wire Works' },
  product: { id: 2, sku: 'PW-4AWG' },
});

describe('UnreturnedLotsSection', () => {
  it('counts a lot of one unit in the singular, as the lot page does', async () => {
    fetchMock.mockResolvedValue(
      new Response(
        JSON.stringify({ items: [lot(11, 1, 'reels'), lot(12, 40, 'reels')], more: false }),
        { status: 200, headers: { 'Content-Type': 'application/json' } },
      ),
    );
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <MemoryRouter>
          <UnreturnedLotsSection />
        </MemoryRouter>
      </QueryClientProvider>,
    );
    expect(await screen.findByText(/^PO PO-11 · PW-4AWG · 1 reel · /)).toBeInTheDocument();
    expect(screen.getByText(/^PO PO-12 · PW-4AWG · 40 reels · /)).toBeInTheDocument();
    expect(screen.queryByText(/1 reels/)).not.toBeInTheDocument();
  });
});
