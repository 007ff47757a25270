import { ChevronLeftIcon, ChevronRightIcon } from '@radix-ui/react-icons';
import { Button, Flex, Text } from '@radix-ui/themes';

interface PagePagerProps {
  /** Names the navigation, e.g. "Pages of the outbox". */
  label: string;
  /** What the rows are, e.g. "Mails", for "Mails 51–100 of 230". */
  noun: string;
  page: number;
  pageSize: number;
  total: number;
  /** The most pages the API serves of one list, when it caps them. */
  maxPages?: number;
  onPage: (page: number) => void;
}

/** Where a page of a long list sits, with the ways to the next and previous ones. */
export function PagePager({
  label,
  noun,
  page,
  pageSize,
  total,
  maxPages = Infinity,
  onPage,
}: PagePagerProps) {
  const pageCount = Math.min(maxPages, Math.ceil(total / pageSize));
  if (pageCount <= 1) return null;
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <Flex asChild justify="between" align="center" gap="3" wrap="wrap">
      <nav aria-label={label}>
        <Text size="2">
          {noun} {first}–{last} of {total}, page {page} of {pageCount}
        </Text>
        <Flex gap="3" wrap="wrap">
          <Button
            variant="soft"
            color="gray"
            highContrast
            disabled={page <= 1}
            onClick={() => onPage(page - 1)}
          >
            <ChevronLeftIcon aria-hidden />
            Previous page
          </Button>
          <Button
            variant="soft"
            color="gray"
            highContrast
            disabled={page >= pageCount}
            onClick={() => onPage(page + 1)}
          >
            Next page
            <ChevronRightIcon aria-hidden />
          </Button>
        </Flex>
      </nav>
    </Flex>
  );
}
