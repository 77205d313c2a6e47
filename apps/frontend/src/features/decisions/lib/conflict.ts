import { isApiError } from '@/lib/api-client';

/** The lot as it stands, sent with a 409 when another decision came first. */
export interface ConflictCurrent {
  status: string;
  version: number;
}

export function decisionConflict(error: unknown): ConflictCurrent | null {
  if (!isApiError(error) || error.status !== 409) return null;
  const current = (error.body as { current?: unknown } | null)?.current;
  if (typeof current !== 'object' || current === null) return { status: 'unknown', version: 0 };
  const { status, version } = current as Record<string, unknown>;
  return {
    status: typeof status === 'string' ? status : 'unknown',
    version: typeof version === 'number' ? version : 0,
  };
}
