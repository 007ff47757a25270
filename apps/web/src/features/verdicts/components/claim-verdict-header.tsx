import { ArrowLeftIcon } from '@radix-ui/react-icons';
import { Flex, Heading, Text } from '@radix-ui/themes';
import type { ClaimDetail } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';

/** The top of the verdict and sign-off pages: the way back to the claim, and which claim. */
export function ClaimVerdictHeader({ claim, title }: { claim: ClaimDetail; title: string }) {
  return (
    <Flex direction="column" gap="2">
      <AppLink to={paths.app.claim.getHref(claim.id)} size="2" highContrast>
        <ArrowLeftIcon aria-hidden className="sl-inline-icon" /> Back to the claim
      </AppLink>
      <Flex gap="3" align="center" wrap="wrap">
        <Heading as="h1" size={{ initial: '6', sm: '7' }}>
          {title}
        </Heading>
        <ClaimStatusBadge status={claim.status} />
      </Flex>
      <Text size="3" className="sl-prose">
        {claim.summary}
      </Text>
    </Flex>
  );
}
