import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from './database.options';

// Used by the TypeORM command line (`npm run migration:run -w @loftwright/api`); the app itself
// builds its connection in AppModule from the validated environment.
export default new DataSource(buildDataSourceOptions(process.env.DATA_DIR ?? './data'));
