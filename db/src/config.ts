import path from 'node:path';
import type { Knex } from 'knex';

/** Default address of the project's own PostgreSQL (CONTRACT.md); DATABASE_URL overrides. */
export const defaultDatabaseUrl = 'postgres://postgres@127.0.0.1:54329/upstroke';

export const migrationsDirectory = path.resolve(__dirname, '..', 'migrations');

export function knexConfig(url = process.env.DATABASE_URL ?? defaultDatabaseUrl): Knex.Config {
  return {
    client: 'pg',
    connection: url,
    pool: { min: 0, max: Number(process.env.DB_POOL_MAX ?? 10) },
    migrations: {
      directory: migrationsDirectory,
      loadExtensions: ['.ts', '.js'],
      tableName: 'knex_migrations',
    },
  };
}
