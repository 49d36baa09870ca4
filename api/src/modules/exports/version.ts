import fs from 'node:fs';
import path from 'node:path';

let cached: string | undefined;

/** The API's version from its package.json (found from source or from dist). */
export function appVersion(): string {
  if (cached) return cached;
  let dir = __dirname;
  for (let i = 0; i < 6; i++) {
    const file = path.join(dir, 'package.json');
    if (fs.existsSync(file)) {
      const pkg = JSON.parse(fs.readFileSync(file, 'utf8')) as { name?: string; version?: string };
      if (pkg.name === '@upstroke/api') return (cached = pkg.version ?? '0.0.0');
    }
    dir = path.dirname(dir);
  }
  return (cached = '0.0.0');
}
