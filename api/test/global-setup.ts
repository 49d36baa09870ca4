import path from 'node:path';
import knex from 'knex';

/** Migrations run once per test run; each test then starts from an empty clinical store. */
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
  } finally {
    await db.destroy();
  }
}
