import { DataSource } from 'typeorm';
import { databaseEnvSchema, parseEnv } from '../config/env.schema';
import { dataSourceOptions } from './data-source-options';

/**
 * A data source on the database the DB_* variables name, outside Nest: for the TypeORM
 * CLI and for tools that write in bulk (seeds-demo's generator).
 */
export function dataSourceFromEnv(variables: NodeJS.ProcessEnv = process.env): DataSource {
  const env = parseEnv(databaseEnvSchema, variables);
  return new DataSource(
    dataSourceOptions({
      host: env.DB_HOST,
      port: env.DB_PORT,
      username: env.DB_USER,
      password: env.DB_PASSWORD,
      database: env.DB_NAME,
    }),
  );
}
