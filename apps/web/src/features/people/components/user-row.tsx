import { Table } from '@radix-ui/themes';
import type { UserListItem } from '@skyledger/contracts';
import { DateTime } from '@/components/ui/date-time';
import { LastSignIn } from './last-sign-in';
import type { ShowNotice } from './people-notice';
import { UserActions } from './user-actions';
import { UserName } from './user-name';
import { UserRole } from './user-role';
import { UserStatusBadge } from './user-status-badge';

interface UserRowProps {
  user: UserListItem;
  isCurrentUser: boolean;
  onNotice: ShowNotice;
}

export function UserRow({ user, isCurrentUser, onNotice }: UserRowProps) {
  return (
    <Table.Row align="center">
      <Table.RowHeaderCell>
        <UserName name={user.displayName} isCurrentUser={isCurrentUser} />
      </Table.RowHeaderCell>
      <Table.Cell className="sl-nowrap">{user.email}</Table.Cell>
      <Table.Cell>
        <UserRole user={user} isCurrentUser={isCurrentUser} onNotice={onNotice} />
      </Table.Cell>
      <Table.Cell>
        <UserStatusBadge status={user.status} />
      </Table.Cell>
      <Table.Cell>
        <DateTime value={user.createdAt} show="date" />
      </Table.Cell>
      <Table.Cell>
        <LastSignIn at={user.lastSignInAt} />
      </Table.Cell>
      <Table.Cell>
        <UserActions user={user} isCurrentUser={isCurrentUser} onNotice={onNotice} />
      </Table.Cell>
    </Table.Row>
  );
}
