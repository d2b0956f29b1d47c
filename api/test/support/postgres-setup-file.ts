import { inject } from 'vitest';
import { TEST_POSTGRES_ENV } from './postgres-test-database';

// Runs before each test file of the api-postgres project, before it imports the app: entity
// column types are chosen from DATABASE_URL when their modules load (database-kind.ts), and
// createTestApp gives each app its own database on this server.
const adminUrl = inject('postgresAdminUrl');
process.env[TEST_POSTGRES_ENV] = adminUrl;
process.env.DATABASE_URL = adminUrl;
