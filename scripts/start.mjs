// `npm start`: everything from a clean clone to the app on http://localhost:8080.
// Uses Node built-ins only until the npm packages are installed.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { buildAll, migrateAndSeed } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { ensureDatabase, ensureRoles, startCluster } from './lib/postgres.mjs';
import { log } from './lib/run.mjs';
import { waitForHttp } from './lib/wait.mjs';

const { jwtSecret: keptJwtSecret } = createRequire(import.meta.url)('./lib/jwt-secret.cjs');

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const port = Number(process.env.PORT ?? 8080);
const pgPort = Number(process.env.PG_PORT ?? 54329);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const stops = [];

function stopAll(code) {
  while (stops.length) {
    try {
      stops.pop()();
    } catch {
      // Keep stopping the rest.
    }
  }
  process.exit(code);
}

/** The token-signing secret, kept in .local/jwt-secret across restarts (lib/jwt-secret.cjs). */
function jwtSecret() {
  const { secret, generated } = keptJwtSecret(root);
  if (generated) log('generated a token-signing secret in .local/jwt-secret');
  return secret;
}

function main() {
  ensureDependencies(root);
  // Migrations run as the schema's owner; the API connects as a role with only its grants.
  let databaseUrl = process.env.DATABASE_URL;
  let migrationUrl = process.env.MIGRATION_DATABASE_URL ?? databaseUrl;
  if (!databaseUrl) {
    const cluster = startCluster({
      dataDir: path.join(root, '.local', 'pg'),
      runDir: path.join(root, '.local', 'run'),
      port: pgPort,
    });
    stops.push(cluster.stop);
    ensureDatabase({ bin: cluster.bin, port: pgPort, name: 'upstroke' });
    const roles = ensureRoles({ bin: cluster.bin, port: pgPort, name: 'upstroke' });
    databaseUrl = roles.appUrl;
    migrationUrl = roles.ownerUrl;
  }
  migrateAndSeed(root, migrationUrl);
  buildAll(root);
  const api = spawn('node', ['api/dist/src/main.js'], {
    cwd: root,
    stdio: 'inherit',
    env: {
      ...process.env,
      NODE_ENV: process.env.NODE_ENV ?? 'production',
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      JWT_SECRET: jwtSecret(),
      SMTP_SINK_PORT: String(smtpPort),
      SMTP_HOST: process.env.SMTP_HOST ?? '127.0.0.1',
      SMTP_PORT: process.env.SMTP_PORT ?? String(smtpPort),
      WEB_DIST: path.join(root, 'web', 'dist'),
      PUBLIC_URL: process.env.PUBLIC_URL ?? `http://localhost:${port}`,
    },
  });
  stops.push(() => api.kill('SIGTERM'));
  api.on('exit', (code) => {
    log(`the API stopped (exit ${code ?? 'signal'})`);
    stopAll(code ?? 0);
  });
  void waitForHttp(`http://127.0.0.1:${port}/api/health`, 60_000, api).then((up) => {
    if (!up) return;
    log(`Upstroke is ready on http://localhost:${port}  (mail sink on 127.0.0.1:${smtpPort})`);
    log('demo accounts, password "upstroke-demo" (demo only: change it in real use):');
    for (const role of ['recorder', 'lead', 'quality', 'admin']) log(`  ${role}@kestrel.test`);
    log('Ctrl-C stops the app and PostgreSQL.');
  });
}

process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));
try {
  main();
} catch (error) {
  process.stderr.write(
    `npm start failed: ${error instanceof Error ? error.message : String(error)}\n`,
  );
  stopAll(1);
}
