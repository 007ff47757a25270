import type { ClaimantView, CreateClaimantRequest } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimantKeys } from './claimant-keys';

export function createClaimant(body: CreateClaimantRequest): Promise<ClaimantView> {
  return api.post<ClaimantView>('/claimants', body);
}

export function useCreateClaimant() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClaimant,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: claimantKeys.searches() }),
  });
}
