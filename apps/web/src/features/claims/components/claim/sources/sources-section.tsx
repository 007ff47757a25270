import { Flex, Text } from '@radix-ui/themes';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { CiteSourceDialog } from './cite-source-dialog';
import { SourceItem } from './source-item';

/** The sources cited for the claim, each with its kind and its reliability grade and reason. */
export function SourcesSection({ claim, user, onNotice }: SectionProps) {
  return (
    <Flex direction="column" gap="4">
      <SectionHeader
        title="Sources"
        action={
          hasClaimRole(user.role, 'contribute') ? (
            <CiteSourceDialog claimId={claim.id} onNotice={onNotice} />
          ) : null
        }
      />
      {claim.sources.length === 0 ? (
        <Text color="gray">No sources cited for this claim yet.</Text>
      ) : (
        <ul className="sl-card-list" aria-label="Sources cited">
          {claim.sources.map((source) => (
            <li key={source.id}>
              <SourceItem claimId={claim.id} source={source} user={user} onNotice={onNotice} />
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
