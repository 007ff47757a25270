import { Button, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import type {
  ClaimDetail,
  ClaimVerdictView,
  CurrentUser,
  VerdictVersionView,
} from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DocumentTitle } from '@/components/ui/document-title';
import { FormError } from '@/components/ui/form-error';
import { useShowNotice, type ShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { useClaim } from '@/features/claims/api/get-claim';
import { hasClaimRole } from '@/features/claims/claim-permissions';
import { useClaimVerdict } from '../api/get-claim-verdict';
import { useStartDraft } from '../api/start-draft';
import { useWorkingsOnHand } from '../hooks/use-workings-on-hand';
import { refusalMessage, verdictStateLabels } from '../verdict-words';
import '../verdicts.css';
import { ClaimVerdictHeader } from './claim-verdict-header';
import { DraftEditor } from './draft-editor';
import { EvidencePanel } from './evidence-panel';
import { ExplainerEvidenceProvider, type ExplainerEvidence } from './explainer/explainer-evidence';
import { VerdictVersionBody } from './verdict-version-view';
import { VersionHistory } from './version-history';

function StartDraft({
  claim,
  latest,
  onNotice,
}: {
  claim: ClaimDetail;
  latest: VerdictVersionView | undefined;
  onNotice: ShowNotice;
}) {
  const start = useStartDraft(claim.id);
  if (claim.status === 'filed') {
    return (
      <Text size="2" color="gray">
        A verdict is drafted once the claim is taken into research.
      </Text>
    );
  }
  if (claim.status !== 'in_research' && claim.status !== 'sent_back') return null;
  return (
    <Flex direction="column" gap="2" align="start">
      <Button
        highContrast
        loading={start.isPending}
        onClick={() =>
          // Awaited: this button gives way to the draft before callbacks would run.
          start.mutateAsync().then(
            (draft) =>
              onNotice({
                tone: 'success',
                text: latest
                  ? `Version ${draft.number} is started from version ${latest.number}.`
                  : 'The draft is started from the template: the fact first, then the claim, then why it misleads.',
              }),
            () => undefined,
          )
        }
      >
        {latest
          ? `Start version ${latest.number + 1} from version ${latest.number}`
          : 'Start the verdict from the template'}
      </Button>
      <FormError message={start.isError ? refusalMessage(start.error) : undefined} />
    </Flex>
  );
}

interface WorkspaceProps {
  claim: ClaimDetail;
  verdict: ClaimVerdictView;
  evidence: ExplainerEvidence;
  user: CurrentUser;
  onNotice: ShowNotice;
}

/** The draft for those who write verdicts; the latest version, read-only, for everyone else. */
function VerdictWorkspace({ claim, verdict, evidence, user, onNotice }: WorkspaceProps) {
  const latest = verdict.versions[0];
  const mayDraft = hasClaimRole(user.role, 'research');
  if (latest?.state === 'draft' && mayDraft) {
    return (
      <Card size="3">
        <DraftEditor key={latest.id} claim={claim} draft={latest} onNotice={onNotice} />
      </Card>
    );
  }
  return (
    <Card size="3" asChild>
      <section aria-labelledby="latest-version-title">
        <Flex direction="column" gap="4">
          <Heading as="h2" size="5" id="latest-version-title">
            {latest
              ? `Version ${latest.number}: ${verdictStateLabels[latest.state].toLowerCase()}`
              : 'No verdict yet'}
          </Heading>
          {latest ? (
            <VerdictVersionBody
              version={latest}
              sources={claim.sources}
              workings={evidence.workings}
              calculators={evidence.calculators}
            />
          ) : (
            <Text>Nobody has drafted a verdict on this claim yet.</Text>
          )}
          {latest?.state === 'submitted' ? (
            <AppLink to={paths.app.signoff.getHref(claim.id)}>Open the sign-off view</AppLink>
          ) : null}
          {mayDraft ? <StartDraft claim={claim} latest={latest} onNotice={onNotice} /> : null}
        </Flex>
      </section>
    </Card>
  );
}

/** The verdict editor beside the claim's evidence, with every version before it. */
export function VerdictPage({ claimId, user }: { claimId: string; user: CurrentUser }) {
  const { data: claim } = useClaim(claimId);
  const { data: verdict } = useClaimVerdict(claimId);
  const onHand = useWorkingsOnHand(claimId);
  const showNotice = useShowNotice();
  const evidence: ExplainerEvidence = { claimId, sources: claim.sources, ...onHand };
  return (
    <Flex direction="column" gap="5">
      <DocumentTitle title={`Verdict: ${claim.summary}`} />
      <ClaimVerdictHeader
        claim={claim}
        title="Verdict"
        purpose="Rate the claim, write the bottom line and the explainer readers will see, with workings and sources from the claim. Each submitted version goes to the copy desk for sign-off."
      />
      <Flex direction="column">
        <Grid columns={{ initial: '1', md: 'minmax(0, 2fr) minmax(0, 1fr)' }} gap="5" align="start">
          <Flex direction="column" gap="6" minWidth="0">
            <ExplainerEvidenceProvider value={evidence}>
              <VerdictWorkspace
                claim={claim}
                verdict={verdict}
                evidence={evidence}
                user={user}
                onNotice={showNotice}
              />
            </ExplainerEvidenceProvider>
            <VersionHistory verdict={verdict} />
          </Flex>
          <EvidencePanel claim={claim} {...onHand} />
        </Grid>
      </Flex>
    </Flex>
  );
}
