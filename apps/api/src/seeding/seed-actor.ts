import { type INestApplicationContext } from '@nestjs/common';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { UsersService } from '../users/users.service';

/** The seeded person with this e-mail, as the services expect an actor. */
export async function seedActor(
  context: INestApplicationContext,
  email: string,
): Promise<AuthenticatedUser> {
  const user = await context.get(UsersService).findByEmail(email);
  if (!user) throw new Error(`Seed the person ${email} before what they do`);
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
}
