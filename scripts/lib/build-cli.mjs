// `node scripts/lib/build-cli.mjs`: the build step on its own (used by npm test).
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildAll } from './build.mjs';

try {
  buildAll(path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..'));
} catch (error) {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
}
