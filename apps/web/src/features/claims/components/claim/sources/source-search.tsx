import { Button, Card, Flex, Text } from '@radix-ui/themes';
import { sourceKindLabels, type SourceView } from '@skyledger/contracts';
import { SearchPicker } from '@/components/ui/search-picker';
import { sourceSearchQueryOptions } from '@/features/sources/api/search-sources';
import { GradeBadge } from './grade-badge';

interface SourceSearchProps {
  onCite: (source: SourceView) => void;
  citing: string | null;
}

/** Finds the desk's sources by a word of the title or the DOI; each result can be cited. */
export function SourceSearch({ onCite, citing }: SourceSearchProps) {
  return (
    <SearchPicker
      label="Find a source"
      hint="The start of a word of its title, or its DOI"
      noun={['source', 'sources']}
      search={sourceSearchQueryOptions}
      renderItem={(source) => (
        <Card>
          <Flex justify="between" align="center" gap="3" wrap="wrap">
            <Flex direction="column" gap="1">
              <Text weight="bold">{source.title}</Text>
              <Flex gap="2" wrap="wrap" align="center">
                <Text size="1" color="gray">
                  {sourceKindLabels[source.kind]}
                  {source.year ? `, ${source.year}` : ''}
                </Text>
                <GradeBadge grade={source.grade} />
              </Flex>
            </Flex>
            <Button
              type="button"
              size="1"
              highContrast
              loading={citing === source.id}
              aria-label={`Cite “${source.title}”`}
              onClick={() => onCite(source)}
            >
              Cite
            </Button>
          </Flex>
        </Card>
      )}
    />
  );
}
