import { DataList, Flex, Heading, Separator, Text } from '@radix-ui/themes';
import type { ClaimSourceView, VerdictVersionView } from '@skyledger/contracts';
import { GradeBadge } from '@/features/claims/components/claim/sources/grade-badge';
import { CitedSources } from './cited-sources';
import { ExplainerHtml } from './explainer-html';
import { RatingWords } from './rating-words';
import type { WorkingsOnHand } from './working-summary';

interface VerdictVersionViewProps extends WorkingsOnHand {
  version: VerdictVersionView;
  sources: readonly ClaimSourceView[];
}

/** One version of the verdict as it stands, read-only: rating, bottom line, explainer. */
export function VerdictVersionBody({
  version,
  sources,
  workings,
  calculators,
}: VerdictVersionViewProps) {
  const primary = sources.find((source) => source.id === version.primarySourceId);
  return (
    <Flex direction="column" gap="4">
      <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
        <DataList.Item>
          <DataList.Label minWidth="10rem">Rating</DataList.Label>
          <DataList.Value>
            <RatingWords ratingId={version.ratingId} />
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label minWidth="10rem">Bottom line</DataList.Label>
          <DataList.Value>
            <Text as="p" className="sl-prose">
              {version.bottomLine || 'Not written yet'}
            </Text>
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label minWidth="10rem">Primary source</DataList.Label>
          <DataList.Value>
            {primary ? (
              <Flex gap="2" align="center" wrap="wrap">
                <Text>{primary.title}</Text>
                <GradeBadge grade={primary.grade} />
              </Flex>
            ) : (
              <Text color="gray">Not chosen yet</Text>
            )}
          </DataList.Value>
        </DataList.Item>
      </DataList.Root>
      <Separator size="4" />
      <Heading as="h3" size="3">
        Explainer
      </Heading>
      <ExplainerHtml html={version.bodyHtml} workings={workings} calculators={calculators} />
      <CitedSources ids={version.citedSourceIds} sources={sources} />
    </Flex>
  );
}
