import { ArrowLeftIcon } from '@radix-ui/react-icons';
import { Flex, Text } from '@radix-ui/themes';
import type { ClaimDetail } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { ClaimStatusBadge } from '@/features/claims/components/claim-status-badge';

/** The top of the verdict and sign-off pages: the way back to the claim, and which claim. */
export function ClaimVerdictHeader({
  claim,
  title,
  purpose,
}: {
  claim: ClaimDetail;
  title: string;
  purpose: string;
}) {
  return (
    <PageHeader
      above={
        <AppLink to={paths.app.claim.getHref(claim.id)} size="2" highContrast>
          <ArrowLeftIcon aria-hidden className="sl-inline-icon" /> Back to the claim
        </AppLink>
      }
      title={title}
      purpose={purpose}
      below={
        <Flex gap="3" align="center" wrap="wrap">
          <Text size="3" weight="bold" className="sl-prose">
            {claim.summary}
          </Text>
          <ClaimStatusBadge status={claim.status} />
        </Flex>
      }
    />
  );
}
