import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { databaseEnvSchema, parseEnv } from '../config/env.schema';
import { dataSourceOptions } from './data-source-options';

/** The data source of the TypeORM CLI (`npm run migration:run -w apps/api`). */
const env = parseEnv(databaseEnvSchema, process.env);

export default new DataSource(
  dataSourceOptions({
    host: env.DB_HOST,
    port: env.DB_PORT,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
  }),
);
