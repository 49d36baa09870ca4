// Installs npm packages when node_modules is missing or older than the lock file.
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { log, run } from './run.mjs';

const stampName = '.upstroke-deps';

function lockHash(root) {
  const hash = crypto.createHash('sha256');
  hash.update(fs.readFileSync(path.join(root, 'package-lock.json')));
  return hash.digest('hex');
}

export function ensureDependencies(root) {
  const stamp = path.join(root, 'node_modules', stampName);
  const want = lockHash(root);
  const have = fs.existsSync(stamp) ? fs.readFileSync(stamp, 'utf8').trim() : '';
  if (have === want) return;
  log('installing npm packages (npm ci)');
  run('npm', ['ci', '--no-audit', '--no-fund', '--loglevel=error'], { cwd: root });
  fs.writeFileSync(stamp, want);
}
