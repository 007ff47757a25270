import { type INestApplicationContext } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { loadEnvFile } from '../config/load-env-file';
import { CliModule } from './cli.module';

/**
 * An application context for a command-line task. Mail is only queued, never sent from
 * here: the API's outbox worker delivers it.
 */
export async function createCliContext(): Promise<INestApplicationContext> {
  loadEnvFile();
  process.env.OUTBOX_WORKER_ENABLED = 'false';
  process.env.LOG_LEVEL ??= 'warn';
  return NestFactory.createApplicationContext(CliModule.forRoot(), { logger: ['error', 'warn'] });
}
