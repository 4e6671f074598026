import type { ListUsersQuery } from '@shared/schemas/admin';

/** Paging and filter of the outbox list, as sent to the API. */
export interface OutboxListParams {
  page: number;
  pageSize: number;
  to?: string;
}

/** Cache keys for the admin screens; every list and detail hangs under `users()` or `outbox()`. */
export const adminKeys = {
  all: ['admin'] as const,
  users: () => [...adminKeys.all, 'users'] as const,
  userList: (query: ListUsersQuery) => [...adminKeys.users(), 'list', query] as const,
  outbox: () => [...adminKeys.all, 'outbox'] as const,
  outboxList: (params: OutboxListParams) => [...adminKeys.outbox(), 'list', params] as const,
  outboxMessage: (id: number) => [...adminKeys.outbox(), 'message', id] as const,
};
