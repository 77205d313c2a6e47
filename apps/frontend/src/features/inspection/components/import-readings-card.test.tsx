import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ImportReadingsCard } from '@/features/inspection/components/import-readings-card';

const fetchMock = vi.fn<typeof fetch>();
vi.stubGlobal('fetch', fetchMock);
afterEach(() => fetchMock.mockReset());

function renderCard() {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <ImportReadingsCard lotId={5} />
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

const csv = () =>
  new File(['unit,conductor,method\n1,power,mass\n'], 'bench.csv', { type: 'text/csv' });

describe('ImportReadingsCard', { timeout: 30_000 }, () => {
  it('lists every refused cell by row and column and says nothing was saved', async () => {
    const body = {
      statusCode: 422,
      error: 'Unprocessable Entity',
      message:
        '2 problem(s) in the file; nothing was imported. Correct them and send the whole file again.',
      errors: [
        { row: 3, column: 'massG', message: 'massG must be a positive number' },
        { row: 4, column: 'instruments', message: 'no instrument with serial XX-1' },
      ],
      path: '/api/lots/5/readings/import',
      requestId: 'r',
    };
    fetchMock.mockResolvedValueOnce(new Response(JSON.stringify(body), { status: 422 }));
    const user = renderCard();
    await user.upload(screen.getByLabelText('CSV file'), csv());
    expect(await screen.findByText('The file was refused: nothing was saved.')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Import errors' });
    const rows = within(table)
      .getAllByRole('row')
      .map((r) => r.textContent);
    expect(rows).toEqual([
      'RowColumnProblem',
      '3massGmassG must be a positive number',
      '4instrumentsno instrument with serial XX-1',
    ]);
    const [url, init] = fetchMock.mock.calls[0] ?? [];
    expect(url).toBe('/api/lots/5/readings/import');
    expect((init?.body as FormData).get('file')).toBeInstanceOf(File);
  });

  it('reports how many readings were imported', async () => {
    fetchMock.mockResolvedValueOnce(
      new Response(JSON.stringify({ imported: 3, readings: [] }), { status: 201 }),
    );
    const user = renderCard();
    await user.upload(screen.getByLabelText('CSV file'), csv());
    expect(
      await screen.findByText('3 readings imported and recomputed by the server.'),
    ).toBeInTheDocument();
  });
});
