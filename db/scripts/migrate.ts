import knex from 'knex';
import { knexConfig } from '../src/config';

/** Applies every pending migration (`npm run db:migrate`; `--rollback` undoes the last batch). */
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
    }
  } finally {
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
