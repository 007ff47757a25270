import { CheckCircledIcon } from '@radix-ui/react-icons';
import { Callout, Flex, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import type { WorkingView } from '@skyledger/contracts';
import { AppLink } from '@/components/ui/app-link';
import { paths } from '@/config/paths';
import { WorkingOutputs } from '@/features/workings/components/working-outputs';

interface SavedWorkingProps {
  calculator: CalculatorInfo;
  working: WorkingView;
  claimId: string;
  claimSummary: string | undefined;
}

/** What the server kept: its own run of the library on the inputs sent, and where to see it. */
export function SavedWorking({ calculator, working, claimId, claimSummary }: SavedWorkingProps) {
  return (
    <Flex direction="column" gap="3">
      <Callout.Root color="jade" highContrast>
        <Callout.Icon>
          <CheckCircledIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>
          Saved to {claimSummary ? `“${claimSummary}”` : 'the claim'}. The server ran{' '}
          {calculator.title.toLowerCase()} again with library {working.libraryVersion} and keeps
          this result.{' '}
          <AppLink to={paths.app.claim.getHref(claimId, 'workings')} underline="always">
            See it on the claim
          </AppLink>
        </Callout.Text>
      </Callout.Root>
      <Text as="p" size="2" weight="bold">
        The server’s result
      </Text>
      <WorkingOutputs working={working} calculator={calculator} />
    </Flex>
  );
}
