import { Button, Flex, Text } from '@radix-ui/themes';
import { roleLabels, type ClaimDetail, type CurrentUser } from '@skyledger/contracts';
import { useState } from 'react';
import { SelectField } from '@/components/ui/select-field';
import type { ShowNotice } from '@/components/ui/toaster';
import { useDeskPeople } from '@/features/people/api/get-desk-people';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useAssignClaim } from '../../api/assign-claim';
import { hasClaimRole, mayAssignClaim, mayTakeClaim } from '../../claim-permissions';
import { staleClaimMessage } from './claim-messages';

const nobody = 'nobody';

interface AssignmentPanelProps {
  claim: ClaimDetail;
  user: CurrentUser;
  onNotice: ShowNotice;
}

/** Who researches the claim; a science editor may take it, a desk chief gives it to anyone. */
export function AssignmentPanel({ claim, user, onNotice }: AssignmentPanelProps) {
  const assign = useAssignClaim(claim.id);
  const send = (assigneeId: string | null, done: string) =>
    assign.mutate(
      { assigneeId, version: claim.version },
      {
        onSuccess: () => onNotice({ tone: 'success', text: done }),
        onError: (error) =>
          onNotice({
            tone: 'problem',
            text: changeErrorMessage(error, staleClaimMessage, {
              assigneeId: { taken: 'Someone else has taken this claim meanwhile' },
            }),
          }),
      },
    );

  return (
    <Flex direction="column" gap="2">
      <Text size="2">
        {claim.assignee ? (
          <>
            Researched by <Text weight="bold">{claim.assignee.displayName}</Text>
            {claim.assignee.id === user.id ? ' (you)' : ''}
          </>
        ) : (
          'Nobody is researching this claim yet.'
        )}
      </Text>
      {mayTakeClaim(user, claim) ? (
        <Flex>
          <Button
            highContrast
            loading={assign.isPending}
            onClick={() => send(user.id, 'You are now researching this claim.')}
          >
            Take this claim
          </Button>
        </Flex>
      ) : null}
      {mayAssignClaim(user, claim) ? (
        <AssignSelect
          claim={claim}
          pending={assign.isPending}
          onAssign={(assigneeId, name) =>
            send(
              assigneeId,
              assigneeId ? `${name} is now researching this claim.` : 'Nobody researches it now.',
            )
          }
        />
      ) : null}
    </Flex>
  );
}

interface AssignSelectProps {
  claim: ClaimDetail;
  pending: boolean;
  onAssign: (assigneeId: string | null, name: string) => void;
}

function AssignSelect({ claim, pending, onAssign }: AssignSelectProps) {
  const { data: people } = useDeskPeople();
  const current = claim.assignee?.id ?? nobody;
  const [chosen, setChosen] = useState(current);
  const options = [
    { value: nobody, label: 'Nobody' },
    ...people
      .filter((person) => hasClaimRole(person.role, 'assignable'))
      .map((person) => ({
        value: person.id,
        label: `${person.displayName} (${roleLabels[person.role].toLowerCase()})`,
      })),
  ];
  const name = people.find((person) => person.id === chosen)?.displayName ?? '';
  return (
    <form
      aria-label="Assign the claim"
      onSubmit={(event) => {
        event.preventDefault();
        onAssign(chosen === nobody ? null : chosen, name);
      }}
    >
      <Flex gap="3" align="end" wrap="wrap">
        <SelectField
          label="Give it to"
          value={chosen}
          options={options}
          onValueChange={setChosen}
        />
        <Button
          type="submit"
          variant="soft"
          highContrast
          loading={pending}
          disabled={chosen === current}
        >
          Assign
        </Button>
      </Flex>
    </form>
  );
}
