import { Text } from '@radix-ui/themes';
import { roleLabels, type UserListItem } from '@skyledger/contracts';
import type { ShowNotice } from './people-notice';
import { RoleSelect } from './role-select';

interface UserRoleProps {
  user: UserListItem;
  isCurrentUser: boolean;
  onNotice: ShowNotice;
}

/** A person's role, to change; your own only as words. */
export function UserRole({ user, isCurrentUser, onNotice }: UserRoleProps) {
  // Another desk chief changes your own role, so nobody locks themself out.
  return isCurrentUser ? (
    <Text>{roleLabels[user.role]}</Text>
  ) : (
    <RoleSelect user={user} onNotice={onNotice} />
  );
}
