import { Code, Flex, Text } from '@radix-ui/themes';
import type { WorkingStep } from '@skyledger/contracts';

/** The derivation as the library wrote it: what each step does, its formula, its result. */
export function WorkingSteps({ steps }: { steps: readonly WorkingStep[] }) {
  return (
    <ol className="sl-list">
      {steps.map((step, index) => (
        <li key={index}>
          <Flex direction="column" gap="1">
            <Text weight="medium">{step.text}</Text>
            <Text size="2" className="sl-break">
              <Code variant="ghost">{step.formula}</Code> → <Text weight="bold">{step.result}</Text>
            </Text>
          </Flex>
        </li>
      ))}
    </ol>
  );
}
