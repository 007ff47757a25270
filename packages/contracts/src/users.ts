import { z } from 'zod';
import { DISPLAY_NAME_MAX_LENGTH, emailSchema } from './auth.js';
import { roleSchema, type Role, type UserStatus } from './roles.js';

export const displayNameSchema = z
  .string()
  .trim()
  .min(1, { error: 'Enter a name' })
  .max(DISPLAY_NAME_MAX_LENGTH, { error: `At most ${DISPLAY_NAME_MAX_LENGTH} characters` });

export const inviteUserSchema = z.object({
  email: emailSchema,
  displayName: displayNameSchema,
  role: roleSchema,
});
export type InviteUserRequest = z.infer<typeof inviteUserSchema>;

export const updateUserSchema = z.object({
  displayName: displayNameSchema.optional(),
  role: roleSchema.optional(),
  status: z.enum(['active', 'disabled']).optional(),
  /** The version the editor last saw; a stale one gets 409. */
  version: z.number().int().min(1),
});
export type UpdateUserRequest = z.infer<typeof updateUserSchema>;

export interface UserListItem {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  status: UserStatus;
  createdAt: string;
  lastSignInAt: string | null;
  version: number;
}

export const userSortFields = [
  'displayName',
  'email',
  'role',
  'status',
  'createdAt',
  'lastSignInAt',
] as const;
export type UserSortField = (typeof userSortFields)[number];
export const sortOrders = ['asc', 'desc'] as const;
export type SortOrder = (typeof sortOrders)[number];

export interface UsersListResponse {
  items: UserListItem[];
  total: number;
}

/** An active person on the desk, for assignee pickers and filters (`GET /api/people`). */
export interface DeskPerson {
  id: string;
  displayName: string;
  role: Role;
}
