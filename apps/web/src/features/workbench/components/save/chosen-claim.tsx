import { Box, Button, Flex, Text } from '@radix-ui/themes';
import { useQuery } from '@tanstack/react-query';
import { claimQueryOptions } from '@/features/claims/api/get-claim';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';
import { isApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/api-error-messages';

/** The claim a working will be saved to, with the way back to the list of claims. */
export function ChosenClaim({ claimId, onChange }: { claimId: string; onChange: () => void }) {
  const claim = useQuery(claimQueryOptions(claimId));
  return (
    <Flex direction="column" gap="2">
      <Text size="2" weight="bold">
        Claim to save it to
      </Text>
      {claim.data ? (
        <Flex gap="2" align="center" wrap="wrap">
          <Text>{claim.data.summary}</Text>
          <ClaimStatusBadge status={claim.data.status} />
        </Flex>
      ) : claim.isError ? (
        <Text color="red" size="2">
          {isApiError(claim.error) && claim.error.status === 404
            ? 'There is no claim at this address. Choose another.'
            : errorMessage(claim.error)}
        </Text>
      ) : (
        <Text size="2" color="gray">
          Loading the claim…
        </Text>
      )}
      <Box>
        <Button variant="soft" color="gray" highContrast onClick={onChange}>
          Choose another claim
        </Button>
      </Box>
    </Flex>
  );
}
