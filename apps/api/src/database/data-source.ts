import 'reflect-metadata';
import { dataSourceFromEnv } from './data-source-from-env';

/** The data source of the TypeORM CLI (`npm run migration:run -w apps/api`). */
export default dataSourceFromEnv();
