import { type DataSourceOptions } from 'typeorm';
import { type DatabaseConfig } from '../config/configuration';
import { entities } from './entities';
import { migrations } from './migrations';

export function dataSourceOptions(config: DatabaseConfig): DataSourceOptions {
  return {
    type: 'mariadb',
    host: config.host,
    port: config.port,
    username: config.username,
    password: config.password,
    database: config.database,
    entities,
    migrations,
    // Schema changes go through reviewed migrations only.
    synchronize: false,
    migrationsRun: false,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    extra: { connectionLimit: 20 },
  };
}
