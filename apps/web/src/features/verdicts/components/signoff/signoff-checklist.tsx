import { CheckCircledIcon, CrossCircledIcon } from '@radix-ui/react-icons';
import { Badge, Flex, Text } from '@radix-ui/themes';
import type { ChecklistItem } from '@skyledger/contracts';

/** Each item of the sign-off checklist, done or open, with what makes it so. */
export function SignoffChecklist({ items }: { items: readonly ChecklistItem[] }) {
  return (
    <ul className="sl-card-list" aria-label="Sign-off checklist">
      {items.map((item) => (
        <li key={item.key}>
          <Flex gap="2" align="start">
            {item.done ? (
              <CheckCircledIcon aria-hidden className="sl-check-done" />
            ) : (
              <CrossCircledIcon aria-hidden className="sl-check-open" />
            )}
            <Flex direction="column" gap="1">
              <Flex gap="2" align="center" wrap="wrap">
                <Text weight="bold" size="2">
                  {item.label}
                </Text>
                <Badge color={item.done ? 'jade' : 'red'} variant="soft" highContrast>
                  {item.done ? 'Done' : 'Open'}
                </Badge>
              </Flex>
              <Text size="2" color="gray" className="sl-break">
                {item.detail}
              </Text>
            </Flex>
          </Flex>
        </li>
      ))}
    </ul>
  );
}
