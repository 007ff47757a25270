import { type Role } from '@skyledger/contracts';

/** Who is calling, as the JWT strategy loaded them from the database for this request. */
export interface AuthenticatedUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
}
