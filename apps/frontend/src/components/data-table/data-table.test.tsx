import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, useLocation } from 'react-router';
import { describe, expect, it, vi } from 'vitest';
import {
  DataTable,
  createDataTableColumnHelper,
  type DataTableProps,
} from '@/components/data-table/data-table';
import { useListParams } from '@/components/data-table/use-list-params';

interface Row {
  id: number;
  name: string;
  code: string;
}
const helper = createDataTableColumnHelper<Row>();
const columns = helper.columns([
  helper.accessor('name', { header: 'Name', enableSorting: true }),
  helper.accessor('code', { header: 'Code' }),
]);

function renderTable(overrides: Partial<DataTableProps<Row>> = {}) {
  const props: DataTableProps<Row> = {
    label: 'Things',
    columns,
    data: { items: [{ id: 1, name: 'Alpha', code: 'A1' }], total: 30 },
    loading: false,
    error: null,
    emptyMessage: 'Nothing here.',
    getRowId: (row) => String(row.id),
    page: 1,
    pageSize: 10,
    sort: null,
    onPageChange: vi.fn(),
    onPageSizeChange: vi.fn(),
    onSortChange: vi.fn(),
    ...overrides,
  };
  render(<DataTable {...props} />);
  return props;
}

describe('DataTable', () => {
  it('renders rows and reports sorting and paging to the caller', async () => {
    const user = userEvent.setup();
    const props = renderTable();
    const table = screen.getByRole('table', { name: 'Things' });
    expect(within(table).getByText('Alpha')).toBeInTheDocument();
    // Only the column marked sortable gets a sort control.
    expect(within(table).getAllByRole('button')).toHaveLength(1);
    await user.click(within(table).getByRole('button', { name: 'Name' }));
    expect(props.onSortChange).toHaveBeenCalledWith({ field: 'name', direction: 'asc' });
    expect(screen.getByText('1–10 of 30')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: /next page/i }));
    expect(props.onPageChange).toHaveBeenCalledWith(2);
  });

  it('toggles an ascending sort to descending', async () => {
    const user = userEvent.setup();
    const props = renderTable({ sort: { field: 'name', direction: 'asc' } });
    await user.click(screen.getByRole('button', { name: /Name/ }));
    expect(props.onSortChange).toHaveBeenCalledWith({ field: 'name', direction: 'desc' });
  });

  it('shows the empty, loading and error states', async () => {
    const user = userEvent.setup();
    const onRetry = vi.fn();
    renderTable({ data: { items: [], total: 0 } });
    expect(screen.getByText('Nothing here.')).toBeInTheDocument();
    renderTable({ data: undefined, loading: true });
    expect(screen.getByRole('progressbar', { name: 'Loading' })).toBeInTheDocument();
    renderTable({ data: undefined, error: new Error('Server unreachable'), onRetry });
    expect(screen.getByText('Server unreachable')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(onRetry).toHaveBeenCalled();
  });
});

function ParamsProbe() {
  const list = useListParams({
    filters: ['q', 'status'],
    defaultSort: { field: 'name', direction: 'asc' },
  });
  const location = useLocation();
  return (
    <div>
      <span data-testid="query">{JSON.stringify(list.query)}</span>
      <span data-testid="search">{location.search}</span>
      <button onClick={() => list.setFilter('status', 'approved')}>filter</button>
      <button onClick={() => list.setSort({ field: 'code', direction: 'desc' })}>sort</button>
      <button onClick={() => list.setPage(3)}>page</button>
    </div>
  );
}

describe('useListParams', () => {
  it('reads the view from the URL and writes changes back to it', async () => {
    const user = userEvent.setup();
    render(
      <MemoryRouter initialEntries={['/x?page=2&q=cab&pageSize=500']}>
        <ParamsProbe />
      </MemoryRouter>,
    );
    expect(JSON.parse(screen.getByTestId('query').textContent ?? '')).toEqual({
      page: '2',
      pageSize: '100',
      sort: 'name:asc',
      q: 'cab',
    });
    await user.click(screen.getByRole('button', { name: 'filter' }));
    // A new filter goes back to page 1.
    expect(screen.getByTestId('search').textContent).toBe('?q=cab&pageSize=500&status=approved');
    await user.click(screen.getByRole('button', { name: 'sort' }));
    await user.click(screen.getByRole('button', { name: 'page' }));
    expect(JSON.parse(screen.getByTestId('query').textContent ?? '')).toMatchObject({
      page: '3',
      sort: 'code:desc',
      status: 'approved',
    });
  });
});
