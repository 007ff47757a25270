import { Card, Flex } from '@radix-ui/themes';
import type { CurrentUser } from '@skyledger/contracts';
import { DocumentTitle } from '@/components/ui/document-title';
import { useShowNotice } from '@/components/ui/toaster';
import { useClaim } from '../../api/get-claim';
import { maySetAside } from '../../claim-permissions';
import { ClaimVerdictLinks } from '@/features/verdicts/components/claim-verdict-links';
import { AssignmentPanel } from './assignment-panel';
import { ClaimHeader } from './claim-header';
import { ClaimTabs } from './claim-tabs';
import { SetAsideDialog } from './set-aside-dialog';

/** The claim page: what was said and by whom, who researches it, and every part of it. */
export function ClaimView({ claimId, user }: { claimId: string; user: CurrentUser }) {
  const { data: claim } = useClaim(claimId);
  const showNotice = useShowNotice();
  return (
    <Flex direction="column" gap="5">
      <DocumentTitle title={claim.summary} />
      <ClaimHeader claim={claim} />
      <Card size="2">
        <Flex justify="between" align="start" gap="4" wrap="wrap">
          <AssignmentPanel claim={claim} user={user} onNotice={showNotice} />
          <ClaimVerdictLinks claim={claim} />
          {maySetAside(user, claim) ? <SetAsideDialog claim={claim} onNotice={showNotice} /> : null}
        </Flex>
      </Card>
      <ClaimTabs claim={claim} user={user} onNotice={showNotice} />
    </Flex>
  );
}
