import type { ClaimQueueQuery } from '@skyledger/contracts';

export const claimKeys = {
  all: ['claims'] as const,
  lists: () => [...claimKeys.all, 'list'] as const,
  list: (query: ClaimQueueQuery) => [...claimKeys.lists(), query] as const,
  details: () => [...claimKeys.all, 'detail'] as const,
  detail: (id: string) => [...claimKeys.details(), id] as const,
  history: (id: string) => [...claimKeys.detail(id), 'history'] as const,
  attachment: (id: string) => [...claimKeys.all, 'attachment', id] as const,
};
