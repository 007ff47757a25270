import { Flex, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import type { WorkingView } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { bandText, isBand, quantityText } from '@/features/workings/format-values';

/** At most this many outputs in a summary: the rest are on the claim page. */
const MAIN_OUTPUTS = 3;

export interface WorkingsOnHand {
  /** The claim's stored workings; undefined while they load. */
  workings: readonly WorkingView[] | undefined;
  calculators: readonly CalculatorInfo[] | undefined;
}

interface WorkingSummaryProps extends WorkingsOnHand {
  workingId: string;
}

/**
 * A working in a few lines, always from the stored working: its calculator, its main
 * numbers with their band, and who ran it when.
 */
export function WorkingSummary({ workingId, workings, calculators }: WorkingSummaryProps) {
  if (!workings) {
    return (
      <Text size="2" color="gray">
        Loading the working…
      </Text>
    );
  }
  const working = workings.find((candidate) => candidate.id === workingId);
  if (!working) {
    return (
      <Text size="2" color="red">
        This working is no longer on the claim.
      </Text>
    );
  }
  const calculator = calculators?.find((candidate) => candidate.id === working.calculatorId);
  const declared = calculator?.outputs ?? [];
  const names = [
    ...declared.map((info) => info.name),
    ...Object.keys(working.outputs).filter((name) => !declared.some((info) => info.name === name)),
  ];
  const main = names
    .map((name) => ({
      name,
      label: declared.find((info) => info.name === name)?.label ?? name,
      output: working.outputs[name],
    }))
    .filter(({ output }) => output?.kind === 'number')
    .slice(0, MAIN_OUTPUTS);
  return (
    <Flex direction="column" gap="1">
      <Text weight="bold" size="2">
        {calculator?.title ?? working.calculatorId}
      </Text>
      <ul className="sl-working-outputs">
        {main.map(({ name, label, output }) => (
          <li key={name}>
            <Text size="2">
              {label}:{' '}
              <Text weight="bold">{quantityText(Number(output!.value), output!.unit)}</Text>
            </Text>
            {isBand(output!.band) ? (
              <Text as="div" size="1" color="gray">
                {bandText(output!.band, output!.unit)}
              </Text>
            ) : null}
          </li>
        ))}
      </ul>
      <Text size="1" color="gray">
        Run by {working.ranBy.displayName}, <DateTime value={working.ranAt} show="date" />;
        recomputed by the server.
      </Text>
    </Flex>
  );
}
