import { outboxQuerySchema, type OutboxPage, type OutboxQuery } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { readUrlQuery, writeUrlQuery } from '@/lib/url-query';
import { outboxKeys } from './outbox-keys';

/** The outbox's state tab and page, as the page's URL holds them. */
export function parseOutboxSearch(searchParams: URLSearchParams): OutboxQuery {
  return readUrlQuery(outboxQuerySchema, searchParams);
}

export function outboxSearchParams(query: OutboxQuery): URLSearchParams {
  return writeUrlQuery(outboxQuerySchema, query, { page: 1 });
}

/** A page of mails, newest first, with how many are in each state. */
export function getOutbox(query: OutboxQuery): Promise<OutboxPage> {
  return api.get<OutboxPage>('/outbox', { params: { ...query } });
}

export const outboxQueryOptions = (query: OutboxQuery) =>
  queryOptions({
    queryKey: outboxKeys.list(query),
    queryFn: () => getOutbox(query),
    // Mails change state by themselves as the worker delivers them.
    staleTime: 5_000,
  });

export function useOutbox(query: OutboxQuery) {
  return useSuspenseQuery(outboxQueryOptions(query));
}
