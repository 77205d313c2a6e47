import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, type ApiErrorBody } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';

export interface ImportRowError {
  /** Spreadsheet row (the header is row 1, the first reading row 2), or null for the whole file. */
  row: number | null;
  column: string | null;
  message: string;
}

export interface ImportResult {
  imported: number;
  readings: unknown[];
}

/** Thrown on 422: the file was refused as a whole, nothing was saved. */
export class ImportRejectedError extends ApiError {
  readonly rowErrors: ImportRowError[];
  constructor(status: number, body: ApiErrorBody, rowErrors: ImportRowError[]) {
    super(status, body, 'The file was refused.');
    this.rowErrors = rowErrors;
  }
}

function rowErrorsOf(body: unknown): ImportRowError[] {
  const list = (body as { errors?: unknown } | null)?.errors;
  if (!Array.isArray(list)) return [];
  return list.map((item: unknown) => {
    const e = item as Partial<Record<'row' | 'column' | 'message', unknown>>;
    return {
      row: typeof e.row === 'number' ? e.row : null,
      column: typeof e.column === 'string' ? e.column : null,
      message: typeof e.message === 'string' ? e.message : String(e.message),
    };
  });
}

export async function importReadings(lotId: number, file: File): Promise<ImportResult> {
  const form = new FormData();
  form.append('file', file);
  const response = await fetch(`/api/lots/${lotId}/readings/import`, {
    method: 'POST',
    credentials: 'include',
    headers: { Accept: 'application/json' },
    body: form,
  });
  const text = await response.text();
  let body: unknown = undefined;
  try {
    body = text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    body = undefined;
  }
  if (response.ok) return body as ImportResult;
  const errorBody =
    body && typeof body === 'object' && 'statusCode' in body ? (body as ApiErrorBody) : null;
  if (response.status === 422 && errorBody) {
    throw new ImportRejectedError(422, errorBody, rowErrorsOf(errorBody));
  }
  throw new ApiError(response.status, errorBody, response.statusText || 'The import failed.');
}

export function useImportReadings(lotId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => importReadings(lotId, file),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.lots.all }),
  });
}
