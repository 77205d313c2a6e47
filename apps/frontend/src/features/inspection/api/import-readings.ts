import type { ImportAnswer, ImportErrorBody, ImportRowError } from '@gaugeproof/api-types';
import { ApiError, apiErrorOf, errorBodyOf, parseAnswer } from '@/lib/api-client';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';

/** One problem of a refused file: its row (the header is row 1) and column, or null for the whole file. */
export type { ImportRowError };
export type ImportResult = ImportAnswer;

/** Thrown on 422: the file was refused as a whole, nothing was saved. */
export class ImportRejectedError extends ApiError {
  readonly rowErrors: ImportRowError[];
  constructor(status: number, body: ImportErrorBody) {
    // Its problems are rows and columns of the file, not request fields.
    super(
      status,
      { ...body, errors: body.errors.map((e) => ({ field: null, message: e.message })) },
      'The file was refused.',
    );
    this.rowErrors = body.errors;
  }
}

/** The contract's ImportErrorBody: an error body whose problems name a row and a column. */
function importErrorBodyOf(value: unknown): ImportErrorBody | null {
  const body = errorBodyOf(value);
  if (!body) return null;
  const rows = (body.errors as unknown[]).map((item) => {
    const e = item as Partial<Record<'row' | 'column' | 'message', unknown>>;
    return {
      row: typeof e.row === 'number' ? e.row : null,
      column: typeof e.column === 'string' ? e.column : null,
      message: String(e.message),
    };
  });
  return { ...body, errors: rows };
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
  const body = parseAnswer(await response.text());
  if (response.ok) return body as ImportResult;
  const rejected = response.status === 422 ? importErrorBodyOf(body) : null;
  if (rejected) throw new ImportRejectedError(422, rejected);
  throw apiErrorOf(response.status, body, response.statusText || 'The import failed.');
}

export function useImportReadings(lotId: number) {
  return useWriteMutation((file: File) => importReadings(lotId, file), {
    refresh: [queryKeys.lots.all],
  });
}
