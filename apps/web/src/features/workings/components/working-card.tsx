import { Card, Flex, Heading, Separator, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import type { CurrentUser, VerdictVersionView, WorkingView } from '@skyledger/contracts';
import type { ReactNode } from 'react';
import { AppLink } from '@/components/ui/app-link';
import { DateTime } from '@/components/ui/date-time';
import type { ShowNotice } from '@/components/ui/toaster';
import { paths } from '@/config/paths';
import { hasClaimRole, mayChangePart } from '@/features/claims/claim-permissions';
import { RemoveWorkingDialog } from './remove-working-dialog';
import { RerunWorking } from './rerun-working';
import { WorkingCautions } from './working-cautions';
import { WorkingInputs } from './working-inputs';
import { WorkingNote } from './working-note';
import { WorkingOutputs } from './working-outputs';
import { WorkingSteps } from './working-steps';

function Part({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Flex direction="column" gap="2">
      <Heading as="h4" size="2" color="gray">
        {title}
      </Heading>
      {children}
    </Flex>
  );
}

interface WorkingCardProps {
  claimId: string;
  working: WorkingView;
  calculator: CalculatorInfo | undefined;
  /** The earliest verdict version that uses this working, if one does. */
  usedBy?: Pick<VerdictVersionView, 'number' | 'state'>;
  user: CurrentUser;
  onNotice: ShowNotice;
}

/** One saved working: who ran what, with which inputs, what came out, and how. */
export function WorkingCard({
  claimId,
  working,
  calculator,
  usedBy,
  user,
  onNotice,
}: WorkingCardProps) {
  const title = calculator?.title ?? working.calculatorId;
  const mayChange = mayChangePart(user, working.ranBy);
  const ranged = working.monteCarlo?.rangedInputs ?? [];
  const inputLabel = (name: string) =>
    calculator?.inputs.find((input) => input.name === name)?.label ?? name;

  return (
    <Card size="3" asChild>
      <article aria-labelledby={`working-${working.id}`}>
        <Flex direction="column" gap="4">
          <Flex direction="column" gap="1">
            <Heading as="h3" size="4" id={`working-${working.id}`}>
              {title}
            </Heading>
            <Text size="2" color="gray">
              Run by {working.ranBy.displayName}, <DateTime value={working.ranAt} />. Library{' '}
              {working.libraryVersion}
              {working.checkedAt ? (
                <>
                  ; computed by the server <DateTime value={working.checkedAt} />
                </>
              ) : null}
              .
            </Text>
          </Flex>
          <Part title="Inputs">
            <WorkingInputs working={working} calculator={calculator} />
          </Part>
          <Part title="Outputs">
            <WorkingOutputs working={working} calculator={calculator} />
            {working.monteCarlo && ranged.length > 0 ? (
              <Text size="1" color="gray">
                Bands from {working.monteCarlo.samples.toLocaleString('en-GB')} Monte Carlo samples
                (seed {working.monteCarlo.seed}) over the range
                {ranged.length === 1 ? '' : 's'} of {ranged.map(inputLabel).join(', ')}.
              </Text>
            ) : null}
          </Part>
          <WorkingCautions cautions={working.cautions} />
          <Part title="Steps">
            <WorkingSteps steps={working.steps} />
          </Part>
          <Part title="Note">
            <WorkingNote
              claimId={claimId}
              working={working}
              mayEdit={mayChange}
              onNotice={onNotice}
            />
          </Part>
          <Separator size="4" />
          <Flex gap="4" align="start" justify="between" wrap="wrap">
            {hasClaimRole(user.role, 'research') ? (
              <RerunWorking claimId={claimId} working={working} calculator={calculator} />
            ) : null}
            <Flex gap="4" align="center" wrap="wrap">
              <AppLink to={paths.app.workbench.getHref(working.calculatorId, claimId)} size="2">
                Open in workbench
              </AppLink>
              {mayChange && usedBy ? (
                <Text size="2" color="gray">
                  {usedBy.state === 'draft'
                    ? `In the draft of version ${usedBy.number} of the verdict: take it out there to remove it.`
                    : `Kept: version ${usedBy.number} of the verdict uses it as it was.`}
                </Text>
              ) : mayChange ? (
                <RemoveWorkingDialog
                  claimId={claimId}
                  working={working}
                  title={title}
                  onNotice={onNotice}
                />
              ) : null}
            </Flex>
          </Flex>
        </Flex>
      </article>
    </Card>
  );
}
