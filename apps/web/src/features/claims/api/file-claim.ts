import type { ClaimDetail, CreateClaimRequest } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { claimKeys } from './claim-keys';

export function fileClaim(body: CreateClaimRequest): Promise<ClaimDetail> {
  return api.post<ClaimDetail>('/claims', body);
}

export function useFileClaim() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fileClaim,
    onSuccess: (claim) => {
      queryClient.setQueryData(claimKeys.detail(claim.id), claim);
      return queryClient.invalidateQueries({ queryKey: claimKeys.lists() });
    },
  });
}
