import knex from 'knex';
import { knexConfig } from '../src/config';
import { applyGrants } from '../src/grants';

/**
 * Applies every pending migration (`npm run db:migrate`; `--rollback` undoes the last
 * batch), then grants the API's role (DB_APP_ROLE, default upstroke_app) its privileges.
 */
async function main(): Promise<void> {
  const db = knex(knexConfig());
  try {
    if (process.argv.includes('--rollback')) {
      const [batch, names] = await db.migrate.rollback();
      console.log(`rolled back batch ${batch}: ${names.length} migrations`);
    } else {
      const [batch, names] = await db.migrate.latest();
      console.log(
        names.length ? `migrated (batch ${batch}): ${names.join(', ')}` : 'database up to date',
      );
      await applyGrants(db, process.env.DB_APP_ROLE ?? 'upstroke_app');
    }
  } finally {
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
