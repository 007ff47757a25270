import { Button, Card, Flex } from '@radix-ui/themes';
import type { ReactNode } from 'react';

interface PickListProps<T extends { id: string }> {
  label: string;
  items: readonly T[];
  /** What the item is, beside its button. */
  describe: (item: T) => ReactNode;
  /** The button's words for a screen reader, naming the item, e.g. "Cite Heat flow…". */
  pickLabel: (item: T) => string;
  /** The button's face, e.g. "Cite". */
  pickText: string;
  onPick: (item: T) => void;
}

/** A list to choose one from, each item with its own button: the editor's insert dialogs. */
export function PickList<T extends { id: string }>({
  label,
  items,
  describe,
  pickLabel,
  pickText,
  onPick,
}: PickListProps<T>) {
  return (
    <ul className="sl-card-list" aria-label={label}>
      {items.map((item) => (
        <li key={item.id}>
          <Card size="2">
            <Flex justify="between" align="start" gap="3" wrap="wrap">
              <div className="sl-grow">{describe(item)}</div>
              <Button
                type="button"
                highContrast
                aria-label={pickLabel(item)}
                onClick={() => onPick(item)}
              >
                {pickText}
              </Button>
            </Flex>
          </Card>
        </li>
      ))}
    </ul>
  );
}
