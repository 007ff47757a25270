import type { OutboxMessageView } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { outboxKeys } from './outbox-keys';

/** Puts a failed or waiting mail back in line now, with a fresh count of attempts. */
export function retryOutboxMessage(id: string): Promise<OutboxMessageView> {
  return api.post<OutboxMessageView>(`/outbox/${encodeURIComponent(id)}/retry`);
}

export function useRetryOutboxMessage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryOutboxMessage,
    // Refreshed after a refusal too: a 409 means the mail moved on meanwhile.
    onSettled: () => queryClient.invalidateQueries({ queryKey: outboxKeys.lists() }),
  });
}
