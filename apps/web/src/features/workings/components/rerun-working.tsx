import { ReloadIcon } from '@radix-ui/react-icons';
import { Button, Callout, Flex, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import type { WorkingRerunResponse, WorkingView } from '@skyledger/contracts';
import { useState } from 'react';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useRerunWorking } from '../api/rerun-working';
import { outputText } from '../format-values';
import { staleWorkingMessage } from './working-messages';

function RerunOutcome({
  outcome,
  calculator,
}: {
  outcome: WorkingRerunResponse;
  calculator: CalculatorInfo | undefined;
}) {
  const label = (name: string) =>
    calculator?.outputs.find((output) => output.name === name)?.label ?? name;
  const versions =
    outcome.previousLibraryVersion === outcome.libraryVersion
      ? `library ${outcome.libraryVersion}`
      : `library ${outcome.previousLibraryVersion} → ${outcome.libraryVersion}`;
  if (!outcome.changed) {
    return (
      <Callout.Root color="jade" size="1" highContrast>
        <Callout.Text>
          Re-run with {versions}: unchanged. Every output is the same as before.
        </Callout.Text>
      </Callout.Root>
    );
  }
  const kept =
    outcome.keptBy === null ? null : (
      <Callout.Text size="2">
        Not stored: version {outcome.keptBy} of the verdict uses this working as it was, and a
        version sent for sign-off does not change. To bring the new result to readers, correct the
        verdict with a new working.
      </Callout.Text>
    );
  return (
    <Callout.Root color="amber" size="1" highContrast>
      <Flex direction="column" gap="2">
        <Callout.Text weight="bold">
          Re-run with {versions}: {outcome.differences.length}{' '}
          {outcome.differences.length === 1 ? 'output changed' : 'outputs changed'}.
        </Callout.Text>
        <ul className="sl-list" aria-label="Outputs that changed">
          {outcome.differences.map((difference) => (
            <li key={difference.output}>
              <Callout.Text size="2">
                <Text weight="bold">{label(difference.output)}</Text>:{' '}
                {outputText(difference.before)} → {outputText(difference.after)}
              </Callout.Text>
            </li>
          ))}
        </ul>
        {kept}
      </Flex>
    </Callout.Root>
  );
}

interface RerunWorkingProps {
  claimId: string;
  working: WorkingView;
  calculator: CalculatorInfo | undefined;
}

/** Runs the working again with the library the server has now, and says what changed. */
export function RerunWorking({ claimId, working, calculator }: RerunWorkingProps) {
  const rerun = useRerunWorking(claimId);
  const [outcome, setOutcome] = useState<WorkingRerunResponse | null>(null);
  return (
    <Flex direction="column" gap="2" align="start">
      <Button
        size="1"
        variant="soft"
        color="gray"
        highContrast
        loading={rerun.isPending}
        onClick={() => {
          setOutcome(null);
          rerun.mutate(
            { workingId: working.id, version: working.version },
            { onSuccess: setOutcome },
          );
        }}
      >
        <ReloadIcon aria-hidden />
        Re-run with the current library
      </Button>
      <div role="status" aria-live="polite">
        {outcome ? <RerunOutcome outcome={outcome} calculator={calculator} /> : null}
        {rerun.isError ? (
          <Text size="2" color="red">
            {changeErrorMessage(rerun.error, staleWorkingMessage)}
          </Text>
        ) : null}
      </div>
    </Flex>
  );
}
