import type { Page } from 'playwright-core';
import { launchBrowser } from './browser';
import pg from 'pg';
import { baseUrl, databaseUrl, demoPassword } from './env';

/** Taps a Live button by its exact accessible name. */
export async function tap(page: Page, name: string): Promise<void> {
  await page.getByRole('button', { name, exact: true }).click();
}

/** Opens a quick dialog and picks one choice in it. */
export async function tapAndPick(page: Page, button: string, ...choices: string[]): Promise<void> {
  await tap(page, button);
  for (const choice of choices) {
    await page.getByRole('dialog').getByRole('button', { name: choice, exact: true }).click();
  }
  await page.getByRole('dialog').waitFor({ state: 'detached' });
}

/** Types an EtCO2 value on the keypad and records it. */
export async function typeEtco2(page: Page, value: string): Promise<void> {
  await tap(page, 'EtCO2');
  const dialog = page.getByRole('dialog');
  for (const digit of value) await dialog.getByRole('button', { name: digit, exact: true }).click();
  await dialog.getByRole('button', { name: 'Record', exact: true }).click();
  await dialog.waitFor({ state: 'detached' });
}

// Plain JavaScript run in the page: tsx would add helpers the page does not have.
const readLocalIds = `async (id) => {
  const db = await new Promise((resolve, reject) => {
    const req = indexedDB.open('upstroke');
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
  const all = (store) => new Promise((resolve) => {
    const req = db.transaction(store).objectStore(store).getAll();
    req.onsuccess = () => resolve(req.result);
  });
  const pick = (rows) => rows.filter((r) => r.resuscitationId === id).map((r) => r.id).sort();
  const result = { events: pick(await all('events')), etco2: pick(await all('etco2')) };
  db.close();
  return result;
}`;

/** Ids the tablet holds in IndexedDB for one record (read with the raw IndexedDB API). */
export function localIds(
  page: Page,
  recordId: string,
): Promise<{ events: string[]; etco2: string[] }> {
  return page.evaluate(`(${readLocalIds})(${JSON.stringify(recordId)})`);
}

export async function serverIds(recordId: string): Promise<{ events: string[]; etco2: string[] }> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const q = (table: string) =>
      client.query<{ id: string }>(
        `select id from ${table} where resuscitation_id = $1 order by id`,
        [recordId],
      );
    const [events, etco2] = await Promise.all([q('resuscitation_events'), q('etco2_samples')]);
    return {
      events: events.rows.map((r) => r.id).sort(),
      etco2: etco2.rows.map((r) => r.id).sort(),
    };
  } finally {
    await client.end();
  }
}

/** Polls until `check` holds or the time runs out (no fixed sleeps). */
export async function until<T>(
  read: () => Promise<T>,
  check: (v: T) => boolean,
  timeoutMs: number,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let last = await read();
  while (!check(last) && Date.now() < deadline) {
    await new Promise((r) => setTimeout(r, 200));
    last = await read();
  }
  return last;
}

export async function apiToken(role: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: `${role}@kestrel.test`, password: demoPassword }),
  });
  return ((await res.json()) as { accessToken: string }).accessToken;
}

/** Chromium for this journey: the shared launcher. */
export const launchChromium = launchBrowser;

// Plain JavaScript for the page: events as the app stores them, straight into IndexedDB, as
// if tapped while offline (thousands of taps by hand would take minutes).
const queueInPage = `async ({ id, n, device }) => {
  const db = await new Promise((ok, ko) => { const r = indexedDB.open('upstroke'); r.onsuccess = () => ok(r.result); r.onerror = () => ko(r.error); });
  const tx = db.transaction('events', 'readwrite');
  const t0 = Date.now();
  for (let i = 0; i < n; i++) tx.objectStore('events').add({ id: crypto.randomUUID(), resuscitationId: id,
    at: new Date(t0 + i).toISOString(), kind: 'note', data: { text: 'queued ' + i }, deviceId: device });
  await new Promise((ok) => { tx.oncomplete = ok; });
  db.close();
}`;

/** Queues `n` note events for a record in the tablet's store (used offline, before a sync). */
export async function queueEvents(
  page: Page,
  recordId: string,
  n: number,
  device: string,
): Promise<void> {
  await page.evaluate(`(${queueInPage})(${JSON.stringify({ id: recordId, n, device })})`);
}
