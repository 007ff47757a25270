import type { CurrentUser, Role, SessionResponse, UserListItem } from '@skyledger/contracts';

// The invented Marrowby Gazette science desk, which works on London's clock.
const desk = { deskTimeZone: 'Europe/London', newsroomName: 'Marrowby Gazette' };

export const deskPeople: Record<Role, CurrentUser> = {
  desk_chief: {
    id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000c1',
    email: 'chief@marrowby-gazette.test',
    displayName: 'Mara Quill',
    role: 'desk_chief',
    status: 'active',
    ...desk,
  },
  science_editor: {
    id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000e1',
    email: 'editor@marrowby-gazette.test',
    displayName: 'Tobias Renn',
    role: 'science_editor',
    status: 'active',
    ...desk,
  },
  copy_desk: {
    id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000d1',
    email: 'copy@marrowby-gazette.test',
    displayName: 'Ines Calder',
    role: 'copy_desk',
    status: 'active',
    ...desk,
  },
  reporter: {
    id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000a1',
    email: 'reporter@marrowby-gazette.test',
    displayName: 'Joss Whitcombe',
    role: 'reporter',
    status: 'active',
    ...desk,
  },
};

export function sessionFor(role: Role, accessToken = `token-${role}`): SessionResponse {
  return { accessToken, expiresIn: 900, user: deskPeople[role] };
}

function listItem(
  { deskTimeZone: _zone, newsroomName: _newsroom, ...user }: CurrentUser,
  extra: Partial<UserListItem> = {},
): UserListItem {
  return {
    ...user,
    createdAt: '2026-01-12T09:30:00.000Z',
    lastSignInAt: '2026-03-02T08:05:00.000Z',
    version: 1,
    ...extra,
  };
}

export const userList: UserListItem[] = [
  listItem(deskPeople.desk_chief, { version: 3 }),
  listItem(deskPeople.copy_desk, { version: 2 }),
  listItem(deskPeople.reporter),
  listItem(deskPeople.science_editor, { version: 4 }),
  {
    id: '7f1c2b4e-0a61-4a8e-9d0c-1f00000000f1',
    email: 'p.lund@marrowby-gazette.test',
    displayName: 'Priya Lund',
    role: 'reporter',
    status: 'invited',
    createdAt: '2026-03-04T14:00:00.000Z',
    lastSignInAt: null,
    version: 1,
  },
];
