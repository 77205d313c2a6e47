import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { Button } from '@mui/material';
import { useState } from 'react';
import { toQueryString } from '@/components/data-table/use-list-params';
import { toasts } from '@/lib/toast-store';

/**
 * Fetches `/api<path>` (a list's `.../export.csv`) with the given filters and saves it.
 * Paging is dropped: the export holds every matching row.
 */
export async function downloadCsv(
  path: string,
  query: Record<string, string>,
  filename: string,
): Promise<void> {
  const { page: _page, pageSize: _pageSize, ...filters } = query;
  const response = await fetch(`/api${path}${toQueryString(filters)}`, {
    credentials: 'include',
    headers: { Accept: 'text/csv' },
  });
  if (!response.ok) {
    let message = `The export failed (${response.status}).`;
    try {
      const body = (await response.json()) as { message?: string | string[] };
      if (body.message) message = [body.message].flat().join('; ');
    } catch {
      // not JSON: keep the status message
    }
    throw new Error(message);
  }
  const url = URL.createObjectURL(await response.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}

interface CsvDownloadButtonProps {
  /** e.g. '/suppliers/export.csv' */
  path: string;
  /** The list's current query (ListParams.query); page and pageSize are ignored. */
  query: Record<string, string>;
  filename: string;
}

export function CsvDownloadButton({ path, query, filename }: CsvDownloadButtonProps) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant="outlined"
      startIcon={<FileDownloadOutlined />}
      disabled={busy}
      onClick={() => {
        setBusy(true);
        downloadCsv(path, query, filename)
          .catch((error: unknown) =>
            toasts.error(error instanceof Error ? error.message : 'The export failed.'),
          )
          .finally(() => setBusy(false));
      }}
    >
      Download CSV
    </Button>
  );
}
