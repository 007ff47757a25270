import type { OutboxQuery } from '@skyledger/contracts';

export const outboxKeys = {
  all: ['outbox'] as const,
  lists: () => [...outboxKeys.all, 'list'] as const,
  list: (query: OutboxQuery) => [...outboxKeys.lists(), query] as const,
};
