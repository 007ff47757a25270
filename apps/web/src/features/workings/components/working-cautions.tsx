import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout, Flex } from '@radix-ui/themes';

/** The limits of the model, kept in view beside its result. */
export function WorkingCautions({ cautions }: { cautions: readonly string[] }) {
  if (cautions.length === 0) return null;
  return (
    <Callout.Root color="amber" size="1" highContrast>
      <Callout.Icon>
        <ExclamationTriangleIcon aria-hidden />
      </Callout.Icon>
      <Flex direction="column" gap="1">
        <Callout.Text weight="bold">Limits of this model</Callout.Text>
        <ul className="sl-list">
          {cautions.map((caution) => (
            <li key={caution}>
              <Callout.Text size="2">{caution}</Callout.Text>
            </li>
          ))}
        </ul>
      </Flex>
    </Callout.Root>
  );
}
