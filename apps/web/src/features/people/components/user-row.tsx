import { Badge, Flex, Table, Text } from '@radix-ui/themes';
import {
  roleLabels,
  userStatusLabels,
  type UserListItem,
  type UserStatus,
} from '@skyledger/contracts';
import { AccountStatusDialog } from './account-status-dialog';
import { DateTime } from '@/components/ui/date-time';
import type { ShowNotice } from './people-notice';
import { ResendInvitationButton } from './resend-invitation-button';
import { RoleSelect } from './role-select';

const statusColors = {
  active: 'jade',
  invited: 'amber',
  disabled: 'gray',
} as const satisfies Record<UserStatus, string>;

interface UserRowProps {
  user: UserListItem;
  isCurrentUser: boolean;
  onNotice: ShowNotice;
}

export function UserRow({ user, isCurrentUser, onNotice }: UserRowProps) {
  return (
    <Table.Row align="center">
      <Table.RowHeaderCell>
        <Flex direction="column">
          <Text weight="bold">{user.displayName}</Text>
          {isCurrentUser ? (
            <Text size="1" color="gray">
              That is you
            </Text>
          ) : null}
        </Flex>
      </Table.RowHeaderCell>
      <Table.Cell className="sl-nowrap">{user.email}</Table.Cell>
      <Table.Cell>
        {/* Your own role and account are changed by another desk chief, so nobody locks themself out. */}
        {isCurrentUser ? (
          <Text>{roleLabels[user.role]}</Text>
        ) : (
          <RoleSelect user={user} onNotice={onNotice} />
        )}
      </Table.Cell>
      <Table.Cell>
        <Badge color={statusColors[user.status]} highContrast variant="soft">
          {userStatusLabels[user.status]}
        </Badge>
      </Table.Cell>
      <Table.Cell>
        <DateTime value={user.createdAt} show="date" />
      </Table.Cell>
      <Table.Cell>
        {user.lastSignInAt ? (
          <DateTime value={user.lastSignInAt} show="date" />
        ) : (
          <Text color="gray">Never</Text>
        )}
      </Table.Cell>
      <Table.Cell>
        <Flex gap="2" wrap="wrap">
          {user.status === 'invited' ? (
            <ResendInvitationButton user={user} onNotice={onNotice} />
          ) : null}
          {!isCurrentUser && user.status !== 'invited' ? (
            <AccountStatusDialog user={user} onNotice={onNotice} />
          ) : null}
        </Flex>
      </Table.Cell>
    </Table.Row>
  );
}
