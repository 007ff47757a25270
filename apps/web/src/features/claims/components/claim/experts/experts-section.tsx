import { Badge, Card, Flex, Text } from '@radix-ui/themes';
import { DateTime } from '@/components/ui/date-time';
import { hasClaimRole } from '../../../claim-permissions';
import type { SectionProps } from '../claim-tabs';
import { SectionHeader } from '../section-header';
import { AddConsultationDialog } from './add-consultation-dialog';

/** The independent experts the desk consulted, what they said, and what they declared. */
export function ExpertsSection({ claim, user, onNotice }: SectionProps) {
  return (
    <Flex direction="column" gap="4">
      <SectionHeader
        title="Experts consulted"
        action={
          hasClaimRole(user.role, 'research') ? (
            <AddConsultationDialog claimId={claim.id} onNotice={onNotice} />
          ) : null
        }
      />
      {claim.consultations.length === 0 ? (
        <Text color="gray">No expert consulted on this claim yet.</Text>
      ) : (
        <ul className="sl-card-list" aria-label="Expert consultations">
          {claim.consultations.map((consultation) => (
            <li key={consultation.id}>
              <Card size="2">
                <Flex direction="column" gap="2">
                  <Flex gap="2" align="center" wrap="wrap">
                    <Text weight="bold">{consultation.name}</Text>
                    <Badge
                      color={consultation.independentOfClaimant ? 'jade' : 'amber'}
                      variant="soft"
                      highContrast
                    >
                      {consultation.independentOfClaimant
                        ? 'Independent of the claimant'
                        : 'Not independent of the claimant'}
                    </Badge>
                  </Flex>
                  <Text size="2">
                    {consultation.field}, {consultation.affiliation}. Consulted{' '}
                    <DateTime value={consultation.consultedOn} calendar />.
                  </Text>
                  <blockquote className="sl-quote">{consultation.quote}</blockquote>
                  <Text size="2">
                    <Text weight="bold">Declared conflicts:</Text> {consultation.declaredConflicts}
                  </Text>
                  <Text size="1" color="gray">
                    Logged by {consultation.loggedBy.displayName}
                  </Text>
                </Flex>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </Flex>
  );
}
