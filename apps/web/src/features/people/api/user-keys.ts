import type { UsersSort } from './get-users';

export const userKeys = {
  all: ['users'] as const,
  lists: () => [...userKeys.all, 'list'] as const,
  list: (sort: UsersSort) => [...userKeys.lists(), sort] as const,
  deskPeople: () => [...userKeys.all, 'desk-people'] as const,
};
