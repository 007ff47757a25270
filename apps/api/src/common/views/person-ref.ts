import { type PersonRef } from '@skyledger/contracts';
import { type User } from '../../users/entities/user.entity';

export function toPersonRef(user: Pick<User, 'id' | 'displayName'>): PersonRef {
  return { id: user.id, displayName: user.displayName };
}
