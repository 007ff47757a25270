import { Flex, Text } from '@radix-ui/themes';
import type { Role } from '@skyledger/contracts';
import { useSearchParams } from 'react-router-dom';
import {
  isSearchable,
  parseSearchUrl,
  searchUrlParams,
  withChanges,
  type SearchView,
} from '../api/search-url';
import { ReindexButton } from './reindex-button';
import { SearchForm } from './search-form';
import { SearchResults } from './search-results';
import { PageHeader } from '@/components/ui/page-header';

/** The desk's search: words, dates and facets, all held in the URL so a search can be shared. */
export function SearchPage({ role }: { role: Role }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const view = parseSearchUrl(searchParams);
  const show = (changes: SearchView) =>
    setSearchParams(searchUrlParams(withChanges(view, changes)));

  return (
    <Flex direction="column" gap="5">
      <PageHeader
        title="Search"
        purpose="Find claims and sources across the whole desk by their words, even with a typo, before you file or research one again. Share the address of any search."
        action={role === 'desk_chief' ? <ReindexButton /> : null}
      />
      {/* A new search from the URL (back, a shared link) starts the form afresh. */}
      <SearchForm key={`${view.q}|${view.from}|${view.to}`} view={view} onSearch={show} />
      {isSearchable(view) ? (
        <SearchResults query={view} onChange={show} />
      ) : (
        <Text as="p" color="gray" className="sl-prose">
          Search reads what each claim says, its summary, claimant and topics, and each
          source&apos;s title, authors and publisher. A word misspelt by a letter is still found.
        </Text>
      )}
    </Flex>
  );
}
