import { Flex, RadioGroup, Text } from '@radix-ui/themes';
import type { ClaimQueueQuery } from '@skyledger/contracts';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { CheckboxField } from '@/components/ui/checkbox-field';
import { PagePager } from '@/components/ui/page-pager';
import { claimsQueryOptions } from '@/features/claims/api/get-claims';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';
import { errorMessage } from '@/lib/api-error-messages';

const pageSize = 8;

/** The desk's claims, most recently changed first, a page at a time, to save a working to. */
export function ClaimPicker({ onPick }: { onPick: (claimId: string) => void }) {
  const id = useId();
  const [page, setPage] = useState(1);
  const [mine, setMine] = useState(false);
  const query: ClaimQueueQuery = {
    page,
    pageSize,
    sort: 'updatedAt',
    order: 'desc',
    ...(mine ? { mine: true } : {}),
  };
  const claims = useQuery({ ...claimsQueryOptions(query), placeholderData: keepPreviousData });
  return (
    <Flex direction="column" gap="3">
      <Flex direction="column" gap="1">
        <Text id={`${id}-label`} size="2" weight="bold">
          Claim to save it to
        </Text>
        {/* The API takes a working on a claim in any state (workings/working-kind.ts checks only the role). */}
        <Text id={`${id}-hint`} size="2" color="gray">
          Every claim on the desk, whatever its state, most recently changed first.
        </Text>
      </Flex>
      <CheckboxField
        label="Only claims assigned to me"
        checked={mine}
        onCheckedChange={(checked) => {
          setMine(checked);
          setPage(1);
        }}
      />
      {claims.isError ? (
        <Text color="red" size="2">
          {errorMessage(claims.error)}
        </Text>
      ) : claims.data ? (
        claims.data.items.length === 0 ? (
          <Text size="2" color="gray">
            {mine ? 'No claims are assigned to you.' : 'There are no claims on the desk yet.'}
          </Text>
        ) : (
          <RadioGroup.Root
            aria-labelledby={`${id}-label`}
            aria-describedby={`${id}-hint`}
            onValueChange={onPick}
            aria-busy={claims.isPlaceholderData}
            className={claims.isPlaceholderData ? 'sl-wb-claims sl-busy' : 'sl-wb-claims'}
          >
            <Flex direction="column" gap="2">
              {claims.data.items.map((claim) => (
                <RadioGroup.Item key={claim.id} value={claim.id}>
                  <Flex gap="2" align="center" wrap="wrap">
                    <Text>{claim.summary}</Text>
                    <ClaimStatusBadge status={claim.status} />
                    <Text size="1" color="gray">
                      {claim.claimant.name}
                    </Text>
                  </Flex>
                </RadioGroup.Item>
              ))}
            </Flex>
          </RadioGroup.Root>
        )
      ) : (
        <Text size="2" color="gray">
          Loading the claims…
        </Text>
      )}
      <PagePager
        label="Pages of claims"
        noun="Claims"
        page={page}
        pageSize={pageSize}
        total={claims.data?.total ?? 0}
        onPage={setPage}
      />
    </Flex>
  );
}
