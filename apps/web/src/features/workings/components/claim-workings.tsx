import { Button, Callout, Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { useQuery } from '@tanstack/react-query';
import { Link as RouterLink } from 'react-router-dom';
import { useShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/features/auth/current-user';
import { hasClaimRole } from '@/features/claims/claim-permissions';
import { claimVerdictQueryOptions } from '@/features/verdicts/api/get-claim-verdict';
import { errorMessage } from '@/lib/api-error-messages';
import { useCalculators } from '../api/get-calculators';
import { useClaimWorkings } from '../api/get-claim-workings';
import { WorkingCard } from './working-card';

/**
 * The workings saved on a claim, oldest first: each calculator's inputs, outputs, band,
 * steps and cautions as the server computed them, with the editor's note.
 */
export function ClaimWorkings({ claimId }: { claimId: string }) {
  const user = useCurrentUser();
  const workings = useClaimWorkings(claimId);
  // Titles and labels only; a working still shows, by its ids, if these fail to load.
  const catalogue = useCalculators();
  const showNotice = useShowNotice();
  const calculatorOf = (id: string) =>
    catalogue.data?.calculators.find((calculator) => calculator.id === id);
  // Which verdict version uses a working, if any: the API refuses to remove it while one does.
  const verdict = useQuery(claimVerdictQueryOptions(claimId));
  const usedBy = (workingId: string) =>
    verdict.data?.versions
      .toReversed()
      .find((version) => version.embeddedWorkingIds.includes(workingId));

  const mayRun = hasClaimRole(user.role, 'research');

  return (
    <Flex direction="column" gap="4">
      <Flex justify="between" align="start" gap="3" wrap="wrap">
        <Flex direction="column" gap="1" maxWidth="640px">
          <Heading as="h2" size="5">
            Workings
          </Heading>
          <Text size="2" color="gray">
            Back-of-envelope checks run on this claim. The server computes every result from the
            inputs alone; these are estimates with the limits shown, not climate model output.
          </Text>
        </Flex>
        {mayRun ? (
          <Button asChild highContrast>
            <RouterLink to={paths.app.workbench.getHref(undefined, claimId)}>
              Run a calculator for this claim
            </RouterLink>
          </Button>
        ) : null}
      </Flex>
      {workings.isPending || catalogue.isPending ? (
        <Flex align="center" gap="3" role="status">
          <Spinner />
          <Text color="gray">Loading the workings…</Text>
        </Flex>
      ) : workings.isError ? (
        <Callout.Root color="red" role="alert">
          <Callout.Text>{errorMessage(workings.error)}</Callout.Text>
        </Callout.Root>
      ) : workings.data.length === 0 ? (
        <Text color="gray">
          No workings on this claim yet.
          {mayRun ? ' Run a calculator in the workbench and save its result here.' : ''}
        </Text>
      ) : (
        <ul className="sl-card-list sl-workings" aria-label="Workings, oldest first">
          {workings.data.map((working) => (
            <li key={working.id}>
              <WorkingCard
                claimId={claimId}
                working={working}
                calculator={calculatorOf(working.calculatorId)}
                usedBy={usedBy(working.id)}
                user={user}
                onNotice={showNotice}
              />
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
