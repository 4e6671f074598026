import { queryOptions, keepPreviousData, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { outboxMessageSchema, outboxPage } from '@shared/schemas/admin';
import { api } from '@/lib/api';
import { adminKeys, type OutboxListParams } from './admin-keys';

const messageResponse = z.object({ message: outboxMessageSchema });

/** Mail the site has sent, newest first, as caught by the local mail catcher. */
export function fetchOutbox(params: OutboxListParams, signal?: AbortSignal) {
  return api.get('/api/admin/outbox', { query: { ...params }, schema: outboxPage, signal });
}

/** One caught message with its full text. */
export function fetchOutboxMessage(id: number, signal?: AbortSignal) {
  return api.get(`/api/admin/outbox/${id}`, { schema: messageResponse, signal }).then((r) => r.message);
}

/**
 * Query options for the outbox list. Mail arrives a moment after the action that sent it, so
 * the list checks again every few seconds while the page is open.
 */
export function outboxQueryOptions(params: OutboxListParams) {
  return queryOptions({
    queryKey: adminKeys.outboxList(params),
    queryFn: ({ signal }) => fetchOutbox(params, signal),
    placeholderData: keepPreviousData,
    refetchInterval: 5_000,
  });
}

/** Query options for one message; a caught message never changes, so it stays fresh. */
export function outboxMessageQueryOptions(id: number) {
  return queryOptions({
    queryKey: adminKeys.outboxMessage(id),
    queryFn: ({ signal }) => fetchOutboxMessage(id, signal),
    staleTime: Infinity,
  });
}

/** The outbox list. */
export function useOutbox(params: OutboxListParams) {
  return useQuery(outboxQueryOptions(params));
}

/** The message open in the reading pane; nothing is fetched while none is chosen. */
export function useOutboxMessage(id: number | null) {
  return useQuery({ ...outboxMessageQueryOptions(id ?? 0), enabled: id !== null });
}
