import 'reflect-metadata';
import { type INestApplicationContext } from '@nestjs/common';
import { type Role } from '@skyledger/contracts';
import { createCliContext } from '../cli/cli-context';
import { UsersService } from '../users/users.service';

export interface SeedPerson {
  email: string;
  displayName: string;
  role: Role;
}

/**
 * What the demo seed (seeds-demo) may do to the database, through the same services the
 * API uses, so seeded data obeys the same rules. Every method is idempotent, keyed by a
 * natural id (e-mail for people): what exists already is left alone.
 */
export class SeedingContext {
  private constructor(private readonly context: INestApplicationContext) {}

  static async open(): Promise<SeedingContext> {
    return new SeedingContext(await createCliContext());
  }

  async person(person: SeedPerson, password: string): Promise<{ id: string; created: boolean }> {
    const users = this.context.get(UsersService);
    const existing = await users.findByEmail(person.email);
    // Left as it is when present, so a second run changes nothing (and the demo keeps
    // whatever was done to it meanwhile).
    if (existing) return { id: existing.id, created: false };
    const user = await users.upsertActiveUser({ ...person, password });
    return { id: user.id, created: true };
  }

  close(): Promise<void> {
    return this.context.close();
  }
}
