import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ProductDialog } from '@/features/products/components/product-dialog';
import type { Product } from '@/features/products/types';
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

function renderDialog(product: Product | null = null, canSetCriteria = true) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={client}>
      <UnitsProvider>
        <ProductDialog product={product} canSetCriteria={canSetCriteria} onClose={onClose} />
      </UnitsProvider>
    </QueryClientProvider>,
  );
  return onClose;
}

afterEach(() => vi.unstubAllGlobals());

/** A saved spool as GET /api/products/:id answers it (invented supplier and SKU). */
const SPOOL: Product = {
  id: 5,
  supplier: { id: 7, name: 'Harbor Strand Co', code: 'HSC', status: 'approved' },
  sku: 'HS-4',
  kind: 'spool',
  description: '4 AWG red, 50 m',
  lengthPerUnitM: 50,
  inspectionLevel: 'S-3',
  aql: '1.0',
  minAreaRatio: 0.98,
  concessionNeedsApproval: false,
  active: true,
  conductors: [
    {
      id: 11,
      position: 0,
      purpose: 'power',
      gauge: '4 AWG',
      gaugeSystem: 'awg',
      nominalAreaMm2: 21.15,
      claimedMaterial: 'copper',
      claimedStrands: null,
      conductorClass: null,
      active: true,
    },
  ],
  inspectionState: { severity: 'normal', reason: null, reducedEligible: false },
  warnings: [],
  version: 2,
  createdAt: '2026-11-02T09:00:00.000Z',
  updatedAt: '2026-11-02T09:00:00.000Z',
};

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

  it('keeps an edit someone else saved over, says so, and saves it on their version', async () => {
    const theirs = { ...SPOOL, description: 'Saved by a colleague', version: 3 };
    const patches: Record<string, unknown>[] = [];
    const fetchMock = vi.fn(async (_input: RequestInfo | URL, init?: RequestInit) => {
      if (init?.method !== 'PATCH') return json(supplierPage);
      const body = JSON.parse(String(init.body)) as Record<string, unknown>;
      patches.push(body);
      if (body.version === 2) {
        return json(
          {
            statusCode: 409,
            error: 'Conflict',
            message:
              'Someone else saved product HS-4 after you opened it; your change was not saved.',
            path: '/api/products/5',
            requestId: 'r2',
            current: theirs,
          },
          409,
        );
      }
      return json({ ...theirs, lengthPerUnitM: 75, version: 4 });
    });
    vi.stubGlobal('fetch', fetchMock);
    const user = userEvent.setup({ delay: null });
    const onClose = renderDialog(SPOOL);

    const length = screen.getByLabelText('Length per unit (m)');
    await user.clear(length);
    await user.paste('75');
    await user.click(screen.getByText('Save'));

    expect(
      await screen.findByText('Someone else saved this product while you were editing'),
    ).toBeInTheDocument();
    // What the user typed stays; nothing was closed.
    expect(screen.getByLabelText('Length per unit (m)')).toHaveValue('75');
    expect(onClose).not.toHaveBeenCalled();
    await user.click(screen.getByText('Save my changes'));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    // Only the changed field goes, on the version the server gave back.
    expect(patches).toEqual([
      { version: 2, lengthPerUnitM: 75 },
      { version: 3, lengthPerUnitM: 75 },
    ]);
  });

  it('loads their version when asked, dropping the edit', async () => {
    const theirs = { ...SPOOL, description: 'Saved by a colleague', version: 3 };
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_input: RequestInfo | URL, init?: RequestInit) =>
        init?.method === 'PATCH'
          ? json(
              {
                statusCode: 409,
                error: 'Conflict',
                message: 'Someone else saved product HS-4 after you opened it.',
                path: '/api/products/5',
                requestId: 'r3',
                current: theirs,
              },
              409,
            )
          : json(supplierPage),
      ),
    );
    const user = userEvent.setup({ delay: null });
    renderDialog(SPOOL);
    const description = screen.getByLabelText('Description');
    await user.clear(description);
    await user.paste('My wording');
    await user.click(screen.getByText('Save'));
    await user.click(await screen.findByText('Load their version'));
    expect(screen.getByLabelText('Description')).toHaveValue('Saved by a colleague');
    expect(screen.queryByText(/while you were editing/)).not.toBeInTheDocument();
  });

  it('shows purchasing the acceptance criteria but not for changing', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => json(supplierPage)),
    );
    renderDialog(SPOOL, false);
    expect(
      screen.getByText(
        'Inspection level, AQL, minimum area and the conductors are acceptance criteria: only a QA lead or an administrator can change them.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByLabelText('Minimum area')).toBeDisabled();
    expect(screen.getByLabelText('Label gauge')).toBeDisabled();
    expect(screen.getByText('Add conductor').closest('button')).toBeDisabled();
    expect(screen.getByLabelText('Description')).toBeEnabled();
  });
});
