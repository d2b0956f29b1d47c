import 'reflect-metadata';
import { resolve } from 'node:path';
import { DataSource } from 'typeorm';
import { buildDataSourceOptions } from './database.options';

// Used by the TypeORM command line (`npm run migration:run -w @loftwright/api`); the app itself
// builds its connection in AppModule from the validated environment. npm runs workspace scripts
// inside api/, so the default data folder is taken from where npm was called (INIT_CWD), as
// `npm start` does.
const dataDir = process.env.DATA_DIR ?? resolve(process.env.INIT_CWD ?? process.cwd(), 'data');

export default new DataSource(buildDataSourceOptions(dataDir));
