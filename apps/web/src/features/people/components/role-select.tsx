import { Select } from '@radix-ui/themes';
import { roleLabels, roles, type Role, type UserListItem } from '@skyledger/contracts';
import { useUpdateUser } from '../api/update-user';
import { describeUserChangeError, type ShowNotice } from './people-notice';

function isRole(value: string): value is Role {
  return (roles as readonly string[]).includes(value);
}

export function RoleSelect({ user, onNotice }: { user: UserListItem; onNotice: ShowNotice }) {
  const updateUser = useUpdateUser();
  const shownRole = updateUser.isPending ? (updateUser.variables.role ?? user.role) : user.role;

  const changeRole = (role: Role) =>
    updateUser.mutate(
      { id: user.id, role, version: user.version },
      {
        onSuccess: () =>
          onNotice({ tone: 'success', text: `${user.displayName} is now ${roleLabels[role]}.` }),
        onError: (error) => onNotice({ tone: 'problem', text: describeUserChangeError(error) }),
      },
    );

  return (
    <Select.Root
      value={shownRole}
      disabled={updateUser.isPending}
      onValueChange={(value) => {
        if (isRole(value) && value !== user.role) changeRole(value);
      }}
    >
      <Select.Trigger variant="soft" color="gray" aria-label={`Role of ${user.displayName}`} />
      <Select.Content position="popper">
        {roles.map((role) => (
          <Select.Item key={role} value={role}>
            {roleLabels[role]}
          </Select.Item>
        ))}
      </Select.Content>
    </Select.Root>
  );
}
