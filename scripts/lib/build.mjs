// Builds the packages and API (tsc -b) and the web app (vite build).
import { log, run } from './run.mjs';

export function buildAll(root) {
  log('building packages and API (tsc -b)');
  run('npx', ['tsc', '-b'], { cwd: root });
  log('building the web app (vite build)');
  run('npm', ['run', 'build', '-w', 'web', '--silent'], { cwd: root });
}

export function migrateAndSeed(root, databaseUrl) {
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    NODE_OPTIONS: '--conditions=upstroke-source',
  };
  log('migrating the database');
  run('npx', ['tsx', 'db/scripts/migrate.ts'], { cwd: root, env });
  log('seeding the demo (idempotent)');
  run('npx', ['tsx', 'db/scripts/seed.ts'], { cwd: root, env });
}
