import { Flex } from '@radix-ui/themes';
import { useQuery, type QueryKey, type UseQueryOptions } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { SearchStatus } from './search-status';
import { TextInputField } from './text-input-field';

interface SearchPickerProps<T extends { id: string }, K extends QueryKey> {
  label: string;
  hint?: string;
  error?: string;
  /** e.g. `['claimant', 'claimants']`, for the line saying what was found. */
  noun: readonly [string, string];
  /** The query for what is typed (already trimmed and settled). */
  search: (q: string) => UseQueryOptions<T[], Error, T[], K>;
  /** One result, with the button that picks it. */
  renderItem: (item: T) => ReactNode;
}

/** A search field that asks as one types, once typing pauses, and lists what it found. */
export function SearchPicker<T extends { id: string }, K extends QueryKey>({
  label,
  hint,
  error,
  noun,
  search,
  renderItem,
}: SearchPickerProps<T, K>) {
  const [typed, setTyped] = useState('');
  const q = useDebouncedValue(typed.trim());
  const results = useQuery(search(q));
  const found = q ? (results.data ?? []) : [];
  return (
    <Flex direction="column" gap="2">
      <TextInputField
        label={label}
        hint={hint}
        error={error}
        type="search"
        autoComplete="off"
        value={typed}
        onChange={(event) => setTyped(event.target.value)}
      />
      <SearchStatus
        q={q}
        pending={results.isPending}
        error={results.error}
        count={found.length}
        noun={noun}
      />
      {found.length > 0 ? (
        <ul className="sl-card-list" aria-label={`${noun[1]} matching “${q}”`}>
          {found.map((item) => (
            <li key={item.id}>{renderItem(item)}</li>
          ))}
        </ul>
      ) : null}
    </Flex>
  );
}
