import knex from 'knex';
import { knexConfig } from '../src/config';
import { seedOrganisation } from '../seeds/demo-organisation';
import { seedDemoRecords } from '../seeds/demo-records';

/** Seeds the invented demo (Kestrel Bay Regional Hospital). Safe to run again. */
async function main(): Promise<void> {
  const db = knex(knexConfig());
  try {
    await seedOrganisation(db);
    const added = await seedDemoRecords(db);
    console.log(added ? `demo seeded: ${added} resuscitations` : 'demo already seeded');
  } finally {
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
