import { Flex, Skeleton, Text } from '@radix-ui/themes';
import { DateTime } from '@/components/ui/date-time';
import { errorMessage } from '@/lib/api-error-messages';
import { useClaimHistory } from '../../../api/get-claim-history';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { describeAction, describeDetails } from './history-words';

/** Everything done to the claim and its parts, from the append-only audit trail, oldest first. */
export function HistorySection({ claim }: SectionProps) {
  const history = useClaimHistory(claim.id);
  return (
    <Flex direction="column" gap="4">
      <SectionHeader title="History" />
      {history.isPending ? (
        <Skeleton height="120px">Loading the history…</Skeleton>
      ) : history.isError ? (
        <Text color="red">The history could not load: {errorMessage(history.error)}</Text>
      ) : (
        <ol className="sl-history" aria-label="History of the claim, oldest first">
          {history.data.map((event) => (
            <li key={event.id}>
              <Text size="1" color="gray">
                <DateTime value={event.at} />
              </Text>
              <Text as="p">
                <Text weight="bold">{event.actor?.displayName ?? 'The desk'}</Text>{' '}
                {describeAction(event)}
              </Text>
              {describeDetails(event).map((line) => (
                <Text key={line} as="p" size="2" color="gray" className="sl-break">
                  {line}
                </Text>
              ))}
            </li>
          ))}
        </ol>
      )}
    </Flex>
  );
}
