import { Flex } from '@radix-ui/themes';
import type { ClaimDetail } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';

/** The ways from a claim page to its verdict and, while a version waits, its sign-off. */
export function ClaimVerdictLinks({ claim }: { claim: Pick<ClaimDetail, 'id' | 'status'> }) {
  return (
    <Flex gap="4" wrap="wrap" align="center">
      <AppLink to={paths.app.verdict.getHref(claim.id)} weight="bold" underline="always">
        Verdict and explainer
      </AppLink>
      {claim.status === 'awaiting_signoff' ? (
        <AppLink to={paths.app.signoff.getHref(claim.id)} weight="bold" underline="always">
          Sign-off
        </AppLink>
      ) : null}
    </Flex>
  );
}
