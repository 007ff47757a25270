import { type CurrentUser, type UserListItem } from '@skyledger/contracts';
import { type AppConfig } from '../config/configuration';
import { type User } from './entities/user.entity';

function toUserSummary(user: User) {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    status: user.status,
  };
}

/** The signed-in person, with the desk settings every screen of theirs needs. */
export function toCurrentUser(
  user: User,
  desk: Pick<AppConfig, 'deskTimeZone' | 'newsroomName'>,
): CurrentUser {
  return {
    ...toUserSummary(user),
    deskTimeZone: desk.deskTimeZone,
    newsroomName: desk.newsroomName,
  };
}

export function toUserListItem(user: User): UserListItem {
  return {
    ...toUserSummary(user),
    createdAt: user.createdAt.toISOString(),
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
    version: user.version,
  };
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}
