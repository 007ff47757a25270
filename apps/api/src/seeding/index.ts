import 'reflect-metadata';
import { type INestApplicationContext } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { type Role } from '@skyledger/contracts';
import { type DataSource } from 'typeorm';
import { loadEnvFile } from '../config/load-env-file';
import { dataSourceFromEnv } from '../database/data-source-from-env';
import { UsersService } from '../users/users.service';
import { ClaimSeeder, type SeedClaim } from './claim-seeder';
import { seedDataset, type SeedDataset } from './dataset-seeder';
import { SeedingModule } from './seeding.module';

export type { SeedClaim, SeedFile } from './claim-seeder';
export type { SeedDataset } from './dataset-seeder';
export type { SeedVerdict, SeedVerdictStep } from './verdict-steps';

/**
 * A bare connection to the API's database (the DB_* variables, or apps/api/.env), no
 * services: for writers that bypass the API's rules on purpose, such as seeds-demo's
 * generator of invented scale-test rows.
 */
export function openDatabase(): Promise<DataSource> {
  loadEnvFile();
  return dataSourceFromEnv().initialize();
}

export interface SeedPerson {
  email: string;
  displayName: string;
  role: Role;
}

/**
 * What the demo seed (seeds-demo) may do to the database, through the same services the
 * API uses, so seeded data obeys the same rules. Every method is idempotent, keyed by a
 * natural id (e-mail for people, the summary for claims, the name for datasets): what
 * exists already is left alone.
 */
export class SeedingContext {
  private constructor(private readonly context: INestApplicationContext) {}

  /** Mail is only queued, never sent from here: the API's outbox worker delivers it. */
  static async open(): Promise<SeedingContext> {
    loadEnvFile();
    process.env.OUTBOX_WORKER_ENABLED = 'false';
    // The API's own scheduler publishes anything the seed schedules.
    process.env.PUBLISHER_ENABLED = 'false';
    process.env.LOG_LEVEL ??= 'warn';
    return new SeedingContext(
      await NestFactory.createApplicationContext(SeedingModule.forRoot(), {
        logger: ['error', 'warn'],
      }),
    );
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

  /** Files a claim and does to it what the spec says, unless one with its summary exists. */
  claim(claim: SeedClaim): Promise<{ id: string; created: boolean }> {
    return new ClaimSeeder(this.context).seed(claim);
  }

  /** Imports a dataset from its CSV, unless one with its name exists. */
  dataset(dataset: SeedDataset): Promise<{ id: string; created: boolean }> {
    return seedDataset(this.context, dataset);
  }

  close(): Promise<void> {
    return this.context.close();
  }
}
