import { ExclamationTriangleIcon, InfoCircledIcon } from '@radix-ui/react-icons';
import { Box, Callout, Flex, Heading, Text } from '@radix-ui/themes';
import type { CalculatorInfo } from '@skyledger/calc';
import { WorkingCautions } from '@/features/workings/components/working-cautions';
import { WorkingSteps } from '@/features/workings/components/working-steps';
import type { LiveRun } from '../../hooks/use-live-run';
import { CalculatorCharts, chartedTables } from '../charts/calculator-charts';
import { OutputsView } from './outputs-view';

const labelOf = (calculator: CalculatorInfo, name: string) =>
  calculator.inputs.find((spec) => spec.name === name)?.label ?? name;

function RunStatus({ calculator, run }: { calculator: CalculatorInfo; run: LiveRun }) {
  if (run.state === 'waiting') {
    return (
      <Callout.Root color="gray" highContrast>
        <Callout.Icon>
          <InfoCircledIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>
          Choose a dataset and a column, or paste points, for{' '}
          {run.missing.map((name) => labelOf(calculator, name)).join(' and ')} to see the result.
        </Callout.Text>
      </Callout.Root>
    );
  }
  if (run.state === 'refused') {
    const rules = Object.entries(run.fieldErrors).map(
      ([name, rule]) => `${labelOf(calculator, name)}: ${rule}`,
    );
    return (
      <Callout.Root color="red">
        <Callout.Icon>
          <ExclamationTriangleIcon aria-hidden />
        </Callout.Icon>
        <Callout.Text>
          No result for these inputs. {[...rules, run.message].filter(Boolean).join('. ')}
        </Callout.Text>
      </Callout.Root>
    );
  }
  return null;
}

/**
 * The live result beside the form: the model's limits first, then the outputs (with their
 * band), the charts and the steps; or what is missing or refused.
 */
export function ResultPanel({
  calculator,
  run,
  headingId,
}: {
  calculator: CalculatorInfo;
  run: LiveRun;
  headingId: string;
}) {
  const hidden = calculator.id === 'worksheet' ? new Set(['results']) : chartedTables;
  return (
    <Flex direction="column" gap="4">
      <Heading as="h2" size="5" id={headingId}>
        Result
      </Heading>
      <WorkingCautions
        cautions={run.state === 'done' ? run.result.cautions : calculator.cautions}
      />
      <Box role="status" aria-live="polite">
        <RunStatus calculator={calculator} run={run} />
      </Box>
      {run.state === 'done' ? (
        <>
          <OutputsView info={calculator.outputs} outputs={run.result.outputs} hidden={hidden} />
          {run.result.monteCarlo ? (
            <Text as="p" size="2" color="gray">
              Band from {run.result.monteCarlo.samples.toLocaleString('en-GB')} Monte Carlo samples
              (seed {run.result.monteCarlo.seed}) over the ranges of{' '}
              {run.result.monteCarlo.rangedInputs
                .map((name) => labelOf(calculator, name))
                .join(', ')}
              .
            </Text>
          ) : null}
          <CalculatorCharts result={run.result} />
          {/* The worksheet's steps are its lines, already shown beside them. */}
          {run.result.calculatorId === 'worksheet' ? null : (
            <Flex direction="column" gap="2">
              <Heading as="h3" size="4">
                How it is worked out
              </Heading>
              <WorkingSteps steps={run.result.steps} />
            </Flex>
          )}
        </>
      ) : null}
    </Flex>
  );
}
