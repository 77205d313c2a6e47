import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ProductDialog } from '@/features/products/components/product-dialog';
import { UnitsProvider } from '@/lib/units';

const supplierPage = {
  items: [{ id: 7, name: 'Harbor Strand Co', code: 'HSC', status: 'approved' }],
  total: 1,
  page: 1,
  pageSize: 100,
};

function json(body: unknown, status = 200) {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

function renderDialog() {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={client}>
      <UnitsProvider>
        <ProductDialog product={null} onClose={onClose} />
      </UnitsProvider>
    </QueryClientProvider>,
  );
  return onClose;
}

afterEach(() => vi.unstubAllGlobals());

// A large MUI form under jsdom on a shared machine: allow time.
describe('ProductDialog', { timeout: 60_000 }, () => {
  it('checks gauge labels as you type and warns when ground is smaller than power', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => json(supplierPage)),
    );
    const user = userEvent.setup({ delay: null });
    renderDialog();

    // getByLabelText, paste: role queries and per-key typing are slow on a form this size.
    const gauge = screen.getByLabelText('Label gauge');
    await user.click(gauge);
    await user.paste('fat');
    expect(await screen.findByText(/is not a size we know/)).toBeInTheDocument();
    await user.clear(gauge);
    await user.paste('4 ga');
    // 4 AWG = 21.15 mm² (REFERENCE §1, ASTM B258).
    expect(await screen.findByText('4 AWG · nominal 21.15 mm²')).toBeInTheDocument();

    await user.click(screen.getByText('Add conductor'));
    await user.click(screen.getAllByLabelText('Label gauge')[1]);
    await user.paste('8');
    expect(
      await screen.findByText(
        'Power is 4 AWG but ground is 8 AWG: ground should be sized like power (common practice).',
      ),
    ).toBeInTheDocument();
    expect(screen.getByText('Special level: samples are destroyed.')).toBeInTheDocument();
  });

  it('shows the server’s field messages and keeps what was typed', async () => {
    const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      if (init?.method === 'POST') {
        return json(
          {
            statusCode: 400,
            error: 'Bad Request',
            message: ['sku must be 1 to 64 characters, no spaces at the ends'],
            path: '/api/products',
            requestId: 'r1',
          },
          400,
        );
      }
      expect(String(input)).toContain('/api/suppliers');
      return json(supplierPage);
    });
    vi.stubGlobal('fetch', fetchMock);
    const user = userEvent.setup({ delay: null });
    renderDialog();

    await user.click(screen.getByRole('combobox', { name: 'Supplier' }));
    await user.click(await screen.findByText(/Harbor Strand Co/));
    for (const [label, text] of [
      ['SKU', 'HS-4'],
      ['Description', '4 AWG red, 50 m'],
      ['Label gauge', '4'],
    ]) {
      await user.click(screen.getByLabelText(label));
      await user.paste(text);
    }
    await user.click(screen.getByText('Add product'));

    expect(
      await screen.findByText('sku must be 1 to 64 characters, no spaces at the ends'),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('SKU')).toHaveValue('HS-4');
    const post = fetchMock.mock.calls.find(([, init]) => init?.method === 'POST');
    await waitFor(() => expect(post).toBeDefined());
    expect(JSON.parse(String(post?.[1]?.body))).toMatchObject({
      supplierId: 7,
      inspectionLevel: 'S-3',
      aql: '1.0',
      minAreaRatio: 0.98,
      conductors: [{ purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' }],
    });
  });
});
