import { CheckIcon } from '@radix-ui/react-icons';
import { Box, Button, Flex, Heading } from '@radix-ui/themes';
import {
  claimStatuses,
  claimStatusLabels,
  searchDocumentTypeLabels,
  searchDocumentTypes,
  type FacetCounts,
  type SearchQuery,
  type SearchResponse,
} from '@skyledger/contracts';
import { useId, useState } from 'react';
import { isFiltered, noFilters, type SearchView } from '../api/search-url';

/** Topics shown before "Show all": the rest are a click away. */
const TOPICS_SHOWN = 10;

interface FacetOption<V extends string> {
  value: V;
  label: string;
  count: number;
}

/** The values found, in the given order, plus the chosen one even when nothing has it now. */
function optionsOf<V extends string>(
  counts: FacetCounts,
  order: readonly V[],
  labels: Partial<Record<V, string>>,
  chosen: V | undefined,
): FacetOption<V>[] {
  const values = order.filter((value) => (counts[value] ?? 0) > 0 || value === chosen);
  return values.map((value) => ({
    value,
    label: labels[value] ?? value,
    count: counts[value] ?? 0,
  }));
}

function topicOrder(counts: FacetCounts, chosen: string | undefined): string[] {
  const topics = Object.keys(counts).sort(
    (a, b) => (counts[b] ?? 0) - (counts[a] ?? 0) || a.localeCompare(b),
  );
  return chosen && !topics.includes(chosen) ? [chosen, ...topics] : topics;
}

interface FacetGroupProps<V extends string> {
  title: string;
  options: FacetOption<V>[];
  chosen: V | undefined;
  onChoose: (value: V | undefined) => void;
  /** How many to show before a "show all" button; all of them when unset. */
  shown?: number;
  /** e.g. `topics`, for "Show all 14 topics". */
  plural: string;
}

/** One facet: a row of toggle buttons with counts; pressing the chosen one lets it go. */
function FacetGroup<V extends string>({
  title,
  options,
  chosen,
  onChoose,
  shown,
  plural,
}: FacetGroupProps<V>) {
  const headingId = useId();
  const [all, setAll] = useState(false);
  if (options.length === 0) return null;
  const visible =
    all || shown === undefined
      ? options
      : options.filter((option, index) => index < shown || option.value === chosen);
  return (
    <Flex asChild direction="column" gap="2">
      <section aria-labelledby={headingId}>
        <Heading as="h3" size="2" id={headingId}>
          {title}
        </Heading>
        <ul className="sl-facet-list">
          {visible.map((option) => {
            const pressed = option.value === chosen;
            return (
              <li key={option.value}>
                <Button
                  type="button"
                  size="1"
                  variant={pressed ? 'solid' : 'soft'}
                  color="gray"
                  highContrast
                  aria-pressed={pressed}
                  onClick={() => onChoose(pressed ? undefined : option.value)}
                >
                  {pressed ? <CheckIcon aria-hidden /> : null}
                  {option.label} <span className="sl-facet-count">{option.count}</span>
                </Button>
              </li>
            );
          })}
        </ul>
        {shown !== undefined && options.length > shown ? (
          <Box>
            <Button
              type="button"
              size="1"
              variant="ghost"
              color="gray"
              highContrast
              aria-expanded={all}
              onClick={() => setAll(!all)}
            >
              {all ? `Show fewer ${plural}` : `Show all ${options.length} ${plural}`}
            </Button>
          </Box>
        ) : null}
      </section>
    </Flex>
  );
}

/** Lets go of every facet and date at once, keeping the words. */
export function ClearFiltersButton({ onChange }: { onChange: (changes: SearchView) => void }) {
  return (
    <Box>
      <Button variant="soft" color="gray" highContrast onClick={() => onChange(noFilters)}>
        Clear the filters
      </Button>
    </Box>
  );
}

interface SearchFacetsProps {
  query: SearchQuery;
  facets: SearchResponse['facets'];
  onChange: (changes: SearchView) => void;
}

/** Kind, status and topic of what was found, with counts; choosing one narrows the search. */
export function SearchFacets({ query, facets, onChange }: SearchFacetsProps) {
  const headingId = useId();
  const topics = topicOrder(facets.topics, query.topic);
  return (
    <Flex asChild direction="column" gap="4">
      <section aria-labelledby={headingId}>
        <Heading as="h2" size="3" id={headingId}>
          Narrow the results
        </Heading>
        <FacetGroup
          title="Kind"
          plural="kinds"
          options={optionsOf(
            facets.type,
            searchDocumentTypes,
            searchDocumentTypeLabels,
            query.type,
          )}
          chosen={query.type}
          onChoose={(type) => onChange({ type })}
        />
        <FacetGroup
          title="Status of the claim"
          plural="statuses"
          options={optionsOf(facets.status, claimStatuses, claimStatusLabels, query.status)}
          chosen={query.status}
          onChoose={(status) => onChange({ status })}
        />
        <FacetGroup
          title="Topic"
          plural="topics"
          options={optionsOf(facets.topics, topics, {}, query.topic)}
          chosen={query.topic}
          onChoose={(topic) => onChange({ topic })}
          shown={TOPICS_SHOWN}
        />
        {isFiltered(query) ? <ClearFiltersButton onChange={onChange} /> : null}
      </section>
    </Flex>
  );
}
