import { SetMetadata } from '@nestjs/common';
import { type Role } from '@skyledger/contracts';

export const ROLES_KEY = 'roles';

/** Limits a route (or a controller) to these roles; without it any signed-in role may call. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
