import { Flex, Heading, Link, Text } from '@radix-ui/themes';
import { references } from '@skyledger/calc';
import { sourceHref } from './source-citation';

/** The calculator's bibliography, in full. */
export function ReferencesList({ keys }: { keys: readonly string[] }) {
  const cited = references.filter((reference) => keys.includes(reference.key));
  if (cited.length === 0) return null;
  return (
    <Flex direction="column" gap="2">
      <Heading as="h2" size="4">
        Sources
      </Heading>
      <ul className="sl-list">
        {cited.map((reference) => {
          const href = sourceHref(reference.key);
          return (
            <li key={reference.key}>
              <Text size="2">
                {reference.citation}{' '}
                {href ? (
                  <Link
                    href={href}
                    target="_blank"
                    rel="noreferrer"
                    className="sl-break"
                    highContrast
                  >
                    {reference.doi ? `doi:${reference.doi}` : href}
                  </Link>
                ) : null}
              </Text>
            </li>
          );
        })}
      </ul>
    </Flex>
  );
}
