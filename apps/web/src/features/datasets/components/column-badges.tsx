import { Badge, Flex } from '@radix-ui/themes';
import { displayUnit } from '@skyledger/calc';
import type { DatasetColumn } from '@skyledger/contracts';

/** A dataset's value columns, each with its unit. */
export function ColumnBadges({ columns }: { columns: readonly DatasetColumn[] }) {
  return (
    <Flex gap="1" wrap="wrap">
      {columns.map((column) => (
        <Badge key={column.key} color="gray" variant="soft" highContrast>
          {column.label} ({displayUnit(column.unit)})
        </Badge>
      ))}
    </Flex>
  );
}
