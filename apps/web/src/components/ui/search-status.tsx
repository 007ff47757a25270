import { Text } from '@radix-ui/themes';
import { errorMessage } from '@/lib/api-error-messages';

interface SearchStatusProps {
  /** What was searched for; nothing is said before anything is typed. */
  q: string;
  pending: boolean;
  error: unknown;
  count: number;
  /** e.g. `['claimant', 'claimants']` */
  noun: readonly [string, string];
}

/** A live line saying how a search as-you-type went, for those who cannot see the list change. */
export function SearchStatus({ q, pending, error, count, noun }: SearchStatusProps) {
  const text = !q
    ? ''
    : error
      ? errorMessage(error)
      : pending
        ? 'Searching…'
        : count === 0
          ? `No ${noun[0]} found for “${q}”.`
          : `${count} ${count === 1 ? noun[0] : noun[1]} found.`;
  return (
    <Text size="1" color={error ? 'red' : 'gray'} role="status">
      {text}
    </Text>
  );
}
