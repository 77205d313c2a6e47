import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SupplierSelect } from '@/components/supplier-select/supplier-select';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

const json = (body: unknown) =>
  new Response(JSON.stringify(body), {
    status: 200,
    headers: { 'Content-Type': 'application/json' },
  });

const page = (items: object[]) => ({ items, total: items.length, page: 1, pageSize: 20 });
const northgate = { id: 150, name: 'Northgate Wire Works', code: 'NWW', status: 'probation' };
const harbor = { id: 2, name: 'Harborline Cable Co.', code: 'HLC', status: 'approved' };

/** Answers like the API: one supplier by id, a search by `q`, and without `q` a first
 * page that does not reach Northgate (a distributor's 150th supplier). */
function serveSuppliers() {
  fetchMock.mockImplementation(async (input) => {
    const url = new URL(String(input), 'http://localhost');
    if (url.pathname === '/api/suppliers/150') return json(northgate);
    const q = url.searchParams.get('q') ?? '';
    if (!q) return json(page([harbor]));
    return json(page([harbor, northgate].filter((s) => s.name.toLowerCase().includes(q))));
  });
}

function Harness({ initial }: { initial: number | null }) {
  const [value, setValue] = useState(initial);
  return (
    <>
      <SupplierSelect required value={value} onChange={setValue} />
      <output aria-label="chosen">{String(value)}</output>
    </>
  );
}

function renderSelect(initial: number | null) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <Harness initial={initial} />
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

describe('SupplierSelect', () => {
  it('finds a supplier beyond the first page by typing, and hands back its id', async () => {
    serveSuppliers();
    const user = renderSelect(null);
    await user.type(screen.getByRole('combobox', { name: /Supplier/ }), 'north');
    await user.click(await screen.findByRole('option', { name: /Northgate Wire Works \(NWW\)/ }));
    expect(screen.getByLabelText('chosen')).toHaveTextContent('150');
    const searched = fetchMock.mock.calls.map(([u]) => String(u));
    expect(searched.some((u) => u.includes('q=north'))).toBe(true);
  });

  it('shows a preselected supplier by name, read by its id', async () => {
    serveSuppliers();
    renderSelect(150);
    expect(await screen.findByDisplayValue('Northgate Wire Works (NWW)')).toBeInTheDocument();
  });
});
