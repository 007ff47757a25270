import { Badge } from '@radix-ui/themes';
import { userStatusLabels, type UserStatus } from '@skyledger/contracts';

const statusColors = {
  active: 'jade',
  invited: 'amber',
  disabled: 'gray',
} as const satisfies Record<UserStatus, string>;

export function UserStatusBadge({ status }: { status: UserStatus }) {
  return (
    <Badge color={statusColors[status]} highContrast variant="soft">
      {userStatusLabels[status]}
    </Badge>
  );
}
