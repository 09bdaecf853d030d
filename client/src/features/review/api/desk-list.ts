import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useSession } from '@/features/auth/use-auth';
import { apiRequest } from '@/lib/api-client';
import { ApiError } from '@/lib/api-error';
import { listPath, type DeskQuery } from '../model/desk-query';

/** One row of a desk table: the record's id and version beside its fields, flattened. */
export type DeskRow = { id: string; version?: number } & Record<string, unknown>;

export interface DeskPage {
  rows: DeskRow[];
  total: number;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Accepts a row as a record ({ id, version, fields }) or already flat; anything else is a broken answer. */
export function parseDeskPage(body: unknown): DeskPage {
  if (!isObject(body) || !Array.isArray(body.rows) || typeof body.total !== 'number') {
    throw new ApiError(200, 'bad_response', 'The server sent a table Breakline cannot read. Reload the page; if it keeps happening, tell your club admin.');
  }
  const rows = body.rows.flatMap((r): DeskRow[] => {
    if (!isObject(r) || typeof r.id !== 'string') return [];
    const { fields, ...rest } = r;
    return [{ ...(isObject(fields) ? fields : {}), ...rest, id: r.id } as DeskRow];
  });
  return { rows, total: body.total };
}

/** A page of a desk table from the server. The previous page stays on screen while the next loads. */
export function useDeskList(q: DeskQuery, enabled = true) {
  const { activeClub } = useSession();
  const path = listPath(q);
  return useQuery({
    queryKey: ['review', activeClub.id, path],
    queryFn: async ({ signal }) => parseDeskPage(await apiRequest<unknown>(path, { signal })),
    placeholderData: keepPreviousData,
    enabled,
  });
}
