import { Blockquote, Button, DataList, Flex, Text } from '@radix-ui/themes';
import { claimantKindLabels } from '@skyledger/contracts';
import { useState } from 'react';
import { mayEditClaim } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { ClaimEditForm } from './claim-edit-form';

/** The claim as said, its summary and topics, and who made it; edited in place. */
export function SummarySection({ claim, user, onNotice }: SectionProps) {
  const [editing, setEditing] = useState(false);
  if (editing) {
    return (
      <ClaimEditForm
        claim={claim}
        user={user}
        onDone={(notice) => {
          setEditing(false);
          if (notice) onNotice(notice);
        }}
      />
    );
  }
  const { claimant } = claim;
  return (
    <Flex direction="column" gap="5">
      <SectionHeader
        title="Summary"
        action={
          mayEditClaim(user, claim) ? (
            <Button variant="soft" highContrast onClick={() => setEditing(true)}>
              Edit the claim
            </Button>
          ) : null
        }
      />
      <Flex direction="column" gap="2">
        <Text size="2" weight="bold" color="gray">
          As it was said
        </Text>
        <Blockquote size="3" className="sl-prose">
          {claim.text}
        </Blockquote>
      </Flex>
      <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
        <DataList.Item>
          <DataList.Label>Neutral summary</DataList.Label>
          <DataList.Value>{claim.summary}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Topics</DataList.Label>
          <DataList.Value>
            {claim.topics.length ? claim.topics.join(', ') : 'None yet'}
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Legal review</DataList.Label>
          <DataList.Value>
            {claim.legalReview ? 'Flagged: counsel looks at it before publishing' : 'Not flagged'}
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Claimant</DataList.Label>
          <DataList.Value>
            <Flex direction="column" gap="1">
              <Text weight="bold">{claimant.name}</Text>
              <Text size="2">
                {claimantKindLabels[claimant.kind]}
                {claimant.affiliation ? ` · ${claimant.affiliation}` : ''}
              </Text>
              {claimant.notes ? (
                <Text size="2" color="gray">
                  {claimant.notes}
                </Text>
              ) : null}
              {claimant.kind === 'private_individual' ? (
                <Text size="2" color="gray">
                  {claimant.nameShownPublicly
                    ? 'A desk chief allowed this name on public pages.'
                    : 'A private individual: never named on public pages.'}
                </Text>
              ) : null}
            </Flex>
          </DataList.Value>
        </DataList.Item>
      </DataList.Root>
    </Flex>
  );
}
