import path from 'node:path';
import knex from 'knex';
import { applyGrants } from '../../db/src/grants';

// Shared with scripts/lib/postgres.mjs (plain CommonJS so both can load it).
// eslint-disable-next-line @typescript-eslint/no-require-imports
const roles = require('../../scripts/lib/db-roles.cjs') as {
  appRole: string;
  rolesSql: (database: string) => string;
};

/**
 * Migrations run once per test run; each test then starts from an empty clinical store.
 * The owner and app roles are made as `npm start` makes them, so the privilege tests can
 * connect as the API's role.
 */
export default async function globalSetup(): Promise<void> {
  const url =
    process.env.TEST_DATABASE_URL ??
    process.env.DATABASE_URL ??
    'postgres://postgres@127.0.0.1:54339/upstroke_test';
  const db = knex({
    client: 'pg',
    connection: url,
    migrations: {
      directory: path.resolve(__dirname, '../../db/migrations'),
      loadExtensions: ['.ts'],
    },
  });
  try {
    await db.migrate.latest();
    await db.raw(roles.rolesSql(new URL(url).pathname.slice(1)));
    await applyGrants(db, roles.appRole);
  } finally {
    await db.destroy();
  }
}
