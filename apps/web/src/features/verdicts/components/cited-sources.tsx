import { Flex, Heading, Link, Text } from '@radix-ui/themes';
import type { ClaimSourceView } from '@skyledger/contracts';
import { GradeBadge } from '@/features/claims/components/claim/sources/grade-badge';

interface CitedSourcesProps {
  /** In order of first citation: the first is [1]. */
  ids: readonly string[];
  sources: readonly ClaimSourceView[];
  /** Gives each entry the id the citations link to; only one list on a page may. */
  anchors?: boolean;
}

/** The explainer's numbered source list, the numbers matching its citations. */
export function CitedSources({ ids, sources, anchors = true }: CitedSourcesProps) {
  return (
    <Flex direction="column" gap="2">
      <Heading as="h3" size="3">
        Sources cited
      </Heading>
      {ids.length === 0 ? (
        <Text size="2" color="gray">
          None yet. Cite a source in the explainer and it is listed here, numbered.
        </Text>
      ) : (
        <ol className="sl-cited-sources" aria-label="Sources cited in the explainer">
          {ids.map((id) => {
            const source = sources.find((candidate) => candidate.id === id);
            return (
              <li key={id} id={anchors ? `source-${id}` : undefined}>
                {source ? (
                  <Flex gap="2" align="center" wrap="wrap">
                    <Text size="2">
                      {source.url ? (
                        <Link href={source.url} target="_blank" rel="noopener noreferrer">
                          {source.title}
                        </Link>
                      ) : (
                        source.title
                      )}
                      {source.year ? ` (${source.year})` : ''}
                    </Text>
                    <GradeBadge grade={source.grade} />
                  </Flex>
                ) : (
                  <Text size="2" color="red">
                    A source no longer cited on the claim
                  </Text>
                )}
              </li>
            );
          })}
        </ol>
      )}
    </Flex>
  );
}
