import { ChevronLeftIcon, ChevronRightIcon } from '@radix-ui/react-icons';
import { Button, Flex, Select, Text } from '@radix-ui/themes';
import type { PaginationState } from '@tanstack/react-table';
import { useId } from 'react';

const pageSizes = [10, 25, 50, 100] as const;

interface QueuePagerProps {
  total: number;
  pagination: PaginationState;
  pageCount: number;
  canPrevious: boolean;
  canNext: boolean;
  onPrevious: () => void;
  onNext: () => void;
  onPageSize: (pageSize: number) => void;
}

/** Where this page sits in the whole queue, and the ways to the next and previous ones. */
export function QueuePager({
  total,
  pagination,
  pageCount,
  canPrevious,
  canNext,
  onPrevious,
  onNext,
  onPageSize,
}: QueuePagerProps) {
  const first = total === 0 ? 0 : pagination.pageIndex * pagination.pageSize + 1;
  const last = Math.min(total, (pagination.pageIndex + 1) * pagination.pageSize);
  return (
    <Flex asChild justify="between" align="center" gap="3" wrap="wrap">
      <nav aria-label="Pages of the queue">
        <Text size="2" aria-live="polite">
          {total === 0
            ? 'No claims'
            : `Claims ${first}–${last} of ${total}, page ${pagination.pageIndex + 1} of ${pageCount}`}
        </Text>
        <Flex gap="3" align="center" wrap="wrap">
          <PageSizeSelect value={pagination.pageSize} onChange={onPageSize} />
          <Button
            variant="soft"
            color="gray"
            highContrast
            disabled={!canPrevious}
            onClick={onPrevious}
          >
            <ChevronLeftIcon aria-hidden />
            Previous page
          </Button>
          <Button variant="soft" color="gray" highContrast disabled={!canNext} onClick={onNext}>
            Next page
            <ChevronRightIcon aria-hidden />
          </Button>
        </Flex>
      </nav>
    </Flex>
  );
}

function PageSizeSelect({ value, onChange }: { value: number; onChange: (size: number) => void }) {
  const labelId = useId();
  const sizes = pageSizes.some((size) => size === value) ? pageSizes : [...pageSizes, value];
  return (
    <Flex gap="2" align="center">
      <Text size="2" id={labelId}>
        Per page
      </Text>
      <Select.Root value={String(value)} onValueChange={(next) => onChange(Number(next))}>
        <Select.Trigger aria-labelledby={labelId} variant="soft" color="gray" />
        <Select.Content position="popper">
          {sizes.map((size) => (
            <Select.Item key={size} value={String(size)}>
              {size}
            </Select.Item>
          ))}
        </Select.Content>
      </Select.Root>
    </Flex>
  );
}
