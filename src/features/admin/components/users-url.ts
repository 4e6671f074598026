import type { z } from 'zod';
import { listUsersQuery, USER_SORTS, type ListUsersQuery } from '@shared/schemas/admin';

/** Columns the users table can sort by (the server's own list). */
export type UserSort = (typeof USER_SORTS)[number];

const shape = listUsersQuery.shape;

function field<T>(schema: z.ZodType<T>, raw: string | null, fallback: T): T {
  const parsed = schema.safeParse(raw === null || raw === '' ? undefined : raw);
  return parsed.success ? parsed.data : fallback;
}

/**
 * Reads the table state from the address bar, field by field, with the shared schema's defaults:
 * a bad value in one parameter (hand-edited link) falls back alone instead of breaking the page.
 */
export function usersQueryFromParams(params: URLSearchParams): ListUsersQuery {
  return {
    q: field(shape.q, params.get('q'), ''),
    role: field(shape.role, params.get('role'), undefined),
    sort: field(shape.sort, params.get('sort'), 'createdAt'),
    dir: field(shape.dir, params.get('dir'), 'desc'),
    page: field(shape.page, params.get('page'), 1),
    pageSize: field(shape.pageSize, params.get('pageSize'), 20),
  };
}

/** Writes the table state back, leaving defaults out so shared links stay short. */
export function usersQueryToParams(query: ListUsersQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.q) params.set('q', query.q);
  if (query.role) params.set('role', query.role);
  if (query.sort !== 'createdAt') params.set('sort', query.sort);
  if (query.dir !== 'desc') params.set('dir', query.dir);
  if (query.page !== 1) params.set('page', String(query.page));
  if (query.pageSize !== 20) params.set('pageSize', String(query.pageSize));
  return params;
}

/**
 * The sort after a click on a column header: the same column flips direction; a new column
 * starts A→Z for words and newest-first for dates. Either way the list goes back to page 1.
 */
export function sortAfterClick(query: ListUsersQuery, column: UserSort): ListUsersQuery {
  if (query.sort === column) return { ...query, dir: query.dir === 'asc' ? 'desc' : 'asc', page: 1 };
  return { ...query, sort: column, dir: column === 'createdAt' ? 'desc' : 'asc', page: 1 };
}
