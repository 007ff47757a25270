import { z } from 'zod';

export const roles = ['reporter', 'science_editor', 'copy_desk', 'desk_chief'] as const;
export type Role = (typeof roles)[number];
export const roleSchema = z.enum(roles);

export const roleLabels: Record<Role, string> = {
  reporter: 'Reporter',
  science_editor: 'Science editor',
  copy_desk: 'Copy desk',
  desk_chief: 'Desk chief',
};

export const userStatuses = ['invited', 'active', 'disabled'] as const;
export type UserStatus = (typeof userStatuses)[number];

export const userStatusLabels: Record<UserStatus, string> = {
  invited: 'Invited',
  active: 'Active',
  disabled: 'Disabled',
};
