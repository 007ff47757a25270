import { Flex, Text } from '@radix-ui/themes';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { AddAppearanceDialog } from './add-appearance-dialog';
import { AppearanceItem } from './appearance-item';

/** Where and when the claim was seen, the first known appearance marked, with captures. */
export function AppearancesSection({ claim, user, onNotice }: SectionProps) {
  const mayAdd = hasClaimRole(user.role, 'contribute');
  const appearances = [...claim.appearances].sort((a, b) => a.seenAt.localeCompare(b.seenAt));
  return (
    <Flex direction="column" gap="4">
      <SectionHeader
        title="Appearances"
        action={mayAdd ? <AddAppearanceDialog claimId={claim.id} onNotice={onNotice} /> : null}
      />
      {appearances.length === 0 ? (
        <Text color="gray">Nobody has said yet where this claim was seen.</Text>
      ) : (
        <ul className="sl-card-list" aria-label="Appearances, earliest first">
          {appearances.map((appearance) => (
            <li key={appearance.id}>
              <AppearanceItem
                claim={claim}
                appearance={appearance}
                user={user}
                onNotice={onNotice}
              />
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
