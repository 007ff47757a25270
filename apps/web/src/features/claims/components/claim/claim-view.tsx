import { Card, Flex } from '@radix-ui/themes';
import type { CurrentUser } from '@skyledger/contracts';
import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { DocumentTitle } from '@/components/ui/document-title';
import { LiveNotice, type Notice } from '@/components/ui/live-notice';
import { useClaim } from '../../api/get-claim';
import { claimPageNotice } from '../../claim-page-state';
import { maySetAside } from '../../claim-permissions';
import { ClaimVerdictLinks } from '@/features/verdicts/components/claim-verdict-links';
import { AssignmentPanel } from './assignment-panel';
import { ClaimHeader } from './claim-header';
import { ClaimTabs } from './claim-tabs';
import { SetAsideDialog } from './set-aside-dialog';

/** The claim page: what was said and by whom, who researches it, and every part of it. */
export function ClaimView({ claimId, user }: { claimId: string; user: CurrentUser }) {
  const { data: claim } = useClaim(claimId);
  const location = useLocation();
  const [notice, setNotice] = useState<Notice | null>(() => claimPageNotice(location.state));
  return (
    <Flex direction="column" gap="5">
      <DocumentTitle title={claim.summary} />
      <ClaimHeader claim={claim} />
      <Card size="2">
        <Flex justify="between" align="start" gap="4" wrap="wrap">
          <AssignmentPanel claim={claim} user={user} onNotice={setNotice} />
          <ClaimVerdictLinks claim={claim} />
          {maySetAside(user, claim) ? <SetAsideDialog claim={claim} onNotice={setNotice} /> : null}
        </Flex>
      </Card>
      {/* No gap for the notice's live region while it is empty. */}
      <Flex direction="column" gap={notice ? '5' : '0'}>
        <LiveNotice notice={notice} />
        <ClaimTabs claim={claim} user={user} onNotice={setNotice} />
      </Flex>
    </Flex>
  );
}
