import { ChevronLeftIcon, ChevronRightIcon } from '@radix-ui/react-icons';
import { Button, Flex, Text } from '@radix-ui/themes';

/** The API serves at most this many pages of one search. */
const PAGE_MAX = 500;

interface SearchPagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
}

export function SearchPager({ page, pageSize, total, onPage }: SearchPagerProps) {
  const pageCount = Math.min(PAGE_MAX, Math.ceil(total / pageSize));
  if (pageCount <= 1) return null;
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <Flex asChild justify="between" align="center" gap="3" wrap="wrap">
      <nav aria-label="Pages of the results">
        <Text size="2">
          Results {first}–{last} of {total}, page {page} of {pageCount}
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
