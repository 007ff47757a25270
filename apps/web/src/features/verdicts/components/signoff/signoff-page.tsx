import { InfoCircledIcon } from '@radix-ui/react-icons';
import { Callout, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import type { CurrentUser } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import { DocumentTitle } from '@/components/ui/document-title';
import { useShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { useClaim } from '@/features/claims/api/get-claim';
import { useSignoff } from '../../api/get-signoff';
import { useWorkingsOnHand } from '../../hooks/use-workings-on-hand';
import '../../verdicts.css';
import { ClaimVerdictHeader } from '../claim-verdict-header';
import { VerdictVersionBody } from '../verdict-version-view';
import { ClaimDiff, VersionDiff } from '../version-diff';
import { DecisionPanel } from './decision-panel';
import { SignoffChecklist } from './signoff-checklist';
import { WaiveReplyDialog } from './waive-reply-dialog';

/** The copy desk's view of a submitted verdict: what changed, the checklist, the decision. */
export function SignoffPage({ claimId, user }: { claimId: string; user: CurrentUser }) {
  const { data: claim } = useClaim(claimId);
  const { data: signoff } = useSignoff(claimId);
  const onHand = useWorkingsOnHand(claimId);
  const showNotice = useShowNotice();
  const { version, previous } = signoff;
  const replyOpen = signoff.checklist.some((item) => item.key === 'rightOfReply' && !item.done);

  return (
    <Flex direction="column" gap="5">
      <DocumentTitle title={`Sign-off: ${claim.summary}`} />
      <ClaimVerdictHeader
        claim={claim}
        title="Sign-off"
        purpose="Check the submitted version against the checklist, then clear it for publishing or send it back with notes. Nobody signs off a version they drafted or last edited."
      />
      <Flex direction="column">
        {!version ? (
          <Card size="3">
            <Flex direction="column" gap="2">
              <Heading as="h2" size="5">
                No version is waiting for sign-off
              </Heading>
              <AppLink to={paths.app.verdict.getHref(claim.id)}>
                Open the verdict and its history
              </AppLink>
            </Flex>
          </Card>
        ) : (
          <Grid
            columns={{ initial: '1', md: 'minmax(0, 2fr) minmax(0, 1fr)' }}
            gap="5"
            align="start"
          >
            <Flex direction="column" gap="5" minWidth="0">
              <Card size="3" asChild>
                <section aria-labelledby="submitted-title">
                  <Flex direction="column" gap="4">
                    <Flex direction="column" gap="1">
                      <Heading as="h2" size="5" id="submitted-title">
                        Version {version.number}, awaiting sign-off
                      </Heading>
                      <Text size="2" color="gray">
                        Drafted by {version.draftedBy.displayName}; last edited by{' '}
                        {version.lastEditedBy.displayName}
                        {version.submittedAt ? (
                          <>
                            ; submitted <DateTime value={version.submittedAt} />
                          </>
                        ) : null}
                        .
                      </Text>
                    </Flex>
                    <VerdictVersionBody
                      version={version}
                      sources={claim.sources}
                      workings={onHand.workings}
                      calculators={onHand.calculators}
                    />
                  </Flex>
                </section>
              </Card>
              <Card size="3" asChild>
                <section aria-labelledby="changes-title">
                  <Flex direction="column" gap="3">
                    <Heading as="h2" size="5" id="changes-title">
                      {previous
                        ? `Changes since version ${previous.number}`
                        : 'Changes since the last version'}
                    </Heading>
                    {previous ? (
                      <>
                        <VersionDiff before={previous} after={version} sources={claim.sources} />
                        {previous.claimAsCleared ? (
                          <Flex direction="column" gap="3">
                            <Heading as="h3" size="3">
                              The claim readers are shown
                            </Heading>
                            <Text size="2" color="gray">
                              As cleared with version {previous.number}, against the claim as it
                              stands now, which clearing this version gives readers.
                            </Text>
                            <ClaimDiff
                              before={previous.claimAsCleared}
                              after={{
                                text: claim.text,
                                summary: claim.summary,
                                claimantName: claim.claimant.name,
                              }}
                            />
                          </Flex>
                        ) : null}
                      </>
                    ) : (
                      <Text>
                        This is the first version submitted: there is nothing to compare with.
                      </Text>
                    )}
                  </Flex>
                </section>
              </Card>
            </Flex>
            <Flex direction="column" gap="5" minWidth="0">
              <Card size="3" asChild>
                <section aria-labelledby="checklist-title">
                  <Flex direction="column" gap="3">
                    <Heading as="h2" size="4" id="checklist-title">
                      Checklist
                    </Heading>
                    <SignoffChecklist items={signoff.checklist} />
                    {replyOpen && user.role === 'desk_chief' ? (
                      <Flex>
                        <WaiveReplyDialog claim={claim} onNotice={showNotice} />
                      </Flex>
                    ) : null}
                  </Flex>
                </section>
              </Card>
              <Callout.Root color="blue" highContrast>
                <Callout.Icon>
                  <InfoCircledIcon aria-hidden />
                </Callout.Icon>
                <Callout.Text>
                  Workings are back-of-envelope estimates, not climate model output. Before you
                  clear, weigh the published assessments and what independent experts said (
                  <AppLink to={paths.app.claim.getHref(claim.id, 'experts')} underline="always">
                    the claim’s expert consultations
                  </AppLink>
                  ).
                </Callout.Text>
              </Callout.Root>
              <Card size="3">
                <DecisionPanel
                  claim={claim}
                  signoff={{ ...signoff, version }}
                  onNotice={showNotice}
                />
              </Card>
            </Flex>
          </Grid>
        )}
      </Flex>
    </Flex>
  );
}
