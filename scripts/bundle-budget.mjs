// The JavaScript each first screen needs before it is usable, gzip-compressed, from the built
// app (web/dist) and Vite's manifest: the entry chunk and the chunks of the sources the screen
// loads first (its route, and for Live the signed-in frame and the tablet's store), each with
// everything it imports statically. Fails (exit 1) when a budget is exceeded.
// `--record` also merges the figures into bench/results.json under `bundle`.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import zlib from 'node:zlib';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const dist = process.env.WEB_DIST ?? path.join(root, 'web', 'dist');
// `targetKB` is the goal; `budgetKB` is what npm test enforces. Live's first screen needs
// react-dom and the router, MUI, Dexie and its own code; zod (the schemas the sync checks the
// server's answers against, the live feed) loads right after the first draw, so a module on
// that path must not build a zod schema when it is evaluated (contracts keep schemas apart:
// `display-settings.ts`, `profile-schema.ts`; capno's `events/corrections.ts`).
const screens = {
  signIn: {
    targetKB: 250,
    budgetKB: 250,
    sources: ['src/features/auth/components/sign-in-page.tsx'],
  },
  live: {
    targetKB: 250,
    budgetKB: 250,
    sources: ['src/app/layout.tsx', 'src/background.ts', 'src/app/routes/live.tsx'],
  },
};

const gzipKB = (file) =>
  zlib.gzipSync(fs.readFileSync(path.join(dist, file)), { level: 9 }).length / 1024;

/** The chunk of `key` and every chunk it imports statically, as output file names. */
function closure(manifest, key, into = new Set()) {
  const chunk = manifest[key];
  if (!chunk || into.has(chunk.file)) return into;
  into.add(chunk.file);
  for (const dep of chunk.imports ?? []) closure(manifest, dep, into);
  return into;
}

function measure() {
  const manifestFile = path.join(dist, '.vite', 'manifest.json');
  if (!fs.existsSync(manifestFile)) throw new Error(`no ${manifestFile}: build the web app first`);
  const manifest = JSON.parse(fs.readFileSync(manifestFile, 'utf8'));
  const entry = Object.keys(manifest).find((k) => manifest[k].isEntry);
  if (!entry) throw new Error('the manifest names no entry chunk');
  const all = fs.readdirSync(path.join(dist, 'assets')).filter((f) => f.endsWith('.js'));
  const sum = (files) => Math.round([...files].reduce((s, f) => s + gzipKB(f), 0) * 10) / 10;
  const figures = { measuredAt: new Date().toISOString() };
  for (const [name, screen] of Object.entries(screens)) {
    const files = closure(manifest, entry);
    for (const source of screen.sources) {
      if (!manifest[source]) throw new Error(`${source} is not a chunk of its own (lazy route)`);
      closure(manifest, source, files);
    }
    figures[name] = {
      initialJsGzipKB: sum(files),
      targetKB: screen.targetKB,
      budgetKB: screen.budgetKB,
    };
  }
  figures.allJsGzipKB = sum(all.map((f) => `assets/${f}`));
  figures.chunks = all.length;
  return figures;
}

const figures = measure();
const over = Object.entries(screens)
  .filter(([name, screen]) => figures[name].initialJsGzipKB > screen.budgetKB)
  .map(([name, screen]) => `${name} ${figures[name].initialJsGzipKB} KB > ${screen.budgetKB} KB`);
process.stdout.write(`${JSON.stringify(figures, null, 2)}\n`);
if (process.argv.includes('--record')) {
  const file = path.join(root, 'bench', 'results.json');
  const all = fs.existsSync(file) ? JSON.parse(fs.readFileSync(file, 'utf8')) : {};
  all.bundle = figures;
  fs.writeFileSync(file, `${JSON.stringify(all, null, 2)}\n`);
}
if (over.length) {
  process.stderr.write(`JavaScript budget exceeded (gzip): ${over.join(', ')}\n`);
  process.exit(1);
}
