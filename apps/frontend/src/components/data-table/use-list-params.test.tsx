import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';
import { describe, expect, it } from 'vitest';
import { useListParams } from '@/components/data-table/use-list-params';

const at =
  (url: string) =>
  ({ children }: { children: ReactNode }) => (
    <MemoryRouter initialEntries={[url]}>{children}</MemoryRouter>
  );

describe('useListParams', () => {
  it('changes several filters at once and goes back to page 1', () => {
    const { result } = renderHook(
      () => useListParams({ filters: ['supplierId', 'productId'] as const }),
      { wrapper: at('/lots?supplierId=3&productId=9&page=4') },
    );
    expect(result.current.page).toBe(4);
    act(() => result.current.setFilters({ supplierId: '7', productId: '' }));
    expect(result.current.filters).toEqual({ supplierId: '7', productId: '' });
    expect(result.current.page).toBe(1);
  });
});
