// The TypeORM CLI wants a file that exports exactly one DataSource.
import { loadConfig } from '../config';
import { createDataSource } from './data-source';

export default createDataSource(loadConfig().databaseUrl);
