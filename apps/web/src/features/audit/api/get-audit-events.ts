import type { AuditEventView, AuditQuery, Page } from '@skyledger/contracts';
import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { auditFilterParams } from './audit-search';
import { auditKeys } from './audit-keys';

/** A page of the audit trail, newest first. */
export function getAuditEvents(query: AuditQuery): Promise<Page<AuditEventView>> {
  return api.get<Page<AuditEventView>>('/audit', {
    params: { ...auditFilterParams(query), page: query.page },
  });
}

export const auditEventsQueryOptions = (query: AuditQuery) =>
  queryOptions({ queryKey: auditKeys.list(query), queryFn: () => getAuditEvents(query) });

export function useAuditEvents(query: AuditQuery) {
  return useSuspenseQuery(auditEventsQueryOptions(query));
}
