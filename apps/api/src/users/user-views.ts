import { type CurrentUser, type UserListItem } from '@skyledger/contracts';
import { type User } from './entities/user.entity';

export function toCurrentUser(user: User): CurrentUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    status: user.status,
  };
}

export function toUserListItem(user: User): UserListItem {
  return {
    ...toCurrentUser(user),
    createdAt: user.createdAt.toISOString(),
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
    version: user.version,
  };
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}
