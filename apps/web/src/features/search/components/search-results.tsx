import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import {
  Button,
  Callout,
  Card,
  Flex,
  Grid,
  Heading,
  Spinner,
  Text,
  VisuallyHidden,
} from '@radix-ui/themes';
import type { SearchQuery } from '@skyledger/contracts';
import { useRef } from 'react';
import { errorMessage } from '@/lib/api-error-messages';
import { useSearchDesk } from '../api/search-desk';
import { isFiltered, type SearchView } from '../api/search-url';
import { SearchFacets } from './search-facets';
import { SearchPager } from './search-pager';
import { SearchResultItem } from './search-result-item';

const count = new Intl.NumberFormat('en-GB');

interface SearchResultsProps {
  query: SearchQuery;
  onChange: (changes: SearchView) => void;
}

/** What a search found: facets beside the results, paged; the previous page stays dimmed while the next loads. */
export function SearchResults({ query, onChange }: SearchResultsProps) {
  const { data, error, isPending, isPlaceholderData, isRefetching, refetch } = useSearchDesk(query);
  const heading = useRef<HTMLHeadingElement>(null);
  const filtered = isFiltered(query);
  const busy = isPending || isPlaceholderData;
  const withFacets = data !== undefined && (data.total > 0 || filtered);
  const status = error
    ? 'The search failed.'
    : data === undefined || busy
      ? 'Searching…'
      : `${count.format(data.total)} ${data.total === 1 ? 'result' : 'results'} for “${query.q}”`;

  return (
    <Grid columns={withFacets ? { initial: '1', md: '15rem 1fr' } : '1'} gap="5" align="start">
      {withFacets ? <SearchFacets query={query} facets={data.facets} onChange={onChange} /> : null}
      <Flex direction="column" gap="4">
        <VisuallyHidden>
          <Heading as="h2" ref={heading} tabIndex={-1}>
            Results
          </Heading>
        </VisuallyHidden>
        <Flex align="center" gap="2">
          {busy ? <Spinner /> : null}
          <Text role="status" size="3" weight="bold" color={error ? 'red' : undefined}>
            {status}
          </Text>
        </Flex>
        {error ? (
          <Callout.Root color="red">
            <Callout.Icon>
              <ExclamationTriangleIcon aria-hidden />
            </Callout.Icon>
            <Callout.Text>
              {errorMessage(error)}{' '}
              <Button
                size="1"
                variant="soft"
                color="gray"
                highContrast
                loading={isRefetching}
                onClick={() => void refetch()}
              >
                Try again
              </Button>
            </Callout.Text>
          </Callout.Root>
        ) : data === undefined ? null : data.total === 0 ? (
          <Card size="3">
            <Flex direction="column" gap="3" align="start">
              <Heading as="h3" size="4">
                Nothing found for “{query.q}”
              </Heading>
              <Text as="p" color="gray">
                {filtered
                  ? 'Nothing matches every word with these filters. Clear the filters, or try other words.'
                  : 'Nothing on the desk matches every word. Check the spelling, or try fewer or other words.'}
              </Text>
            </Flex>
          </Card>
        ) : (
          <div aria-busy={busy} className={busy ? 'sl-busy' : undefined}>
            <Flex direction="column" gap="4">
              <ol className="sl-card-list" aria-label={`Results for “${query.q}”`}>
                {data.items.map((hit) => (
                  <li key={`${hit.type}-${hit.id}`}>
                    <SearchResultItem hit={hit} />
                  </li>
                ))}
              </ol>
              <SearchPager
                page={data.page}
                pageSize={data.pageSize}
                total={data.total}
                onPage={(page) => {
                  onChange({ page });
                  heading.current?.focus();
                }}
              />
            </Flex>
          </div>
        )}
      </Flex>
    </Grid>
  );
}
