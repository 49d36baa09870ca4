import { PLAUSIBLE } from '@upstroke/contracts';
import type { Db } from '../../src/db/knex';

interface Column {
  table: string;
  column: string;
  type: string;
}

// A mail with its PDF attached is text of a few hundred kB; the hostile string is 1.5 MB.
const HUGE_TEXT = 1_000_000;

/** Why a JSON value stored in PostgreSQL is hostile, or null. */
function jsonProblem(v: unknown, depth = 0): string | null {
  if (depth > PLAUSIBLE.jsonDepth) return `nested deeper than ${PLAUSIBLE.jsonDepth}`;
  if (typeof v === 'number')
    return Number.isSafeInteger(v) || (Number.isFinite(v) && !Number.isInteger(v))
      ? null
      : `number ${v}`;
  if (typeof v === 'string') return v.length > HUGE_TEXT ? `text of ${v.length} characters` : null;
  if (v && typeof v === 'object')
    for (const x of Object.values(v)) {
      const p = jsonProblem(x, depth + 1);
      if (p) return p;
    }
  return null;
}

/** One SQL condition per column type that no plausible stored value meets. */
function hostileWhere(c: Column): string | null {
  const col = `"${c.column}"`;
  const { min, max } = PLAUSIBLE.years;
  if (c.type === 'double precision' || c.type === 'real' || c.type === 'numeric')
    return `${col} in ('Infinity', '-Infinity', 'NaN')`;
  if (c.type === 'bigint') return `abs(${col}) > ${Number.MAX_SAFE_INTEGER}`;
  if (c.type.startsWith('timestamp') || c.type === 'date')
    return `extract(year from ${col}) not between ${min} and ${max}`;
  if (c.type === 'text' || c.type === 'character varying') return `length(${col}) > ${HUGE_TEXT}`;
  return null;
}

/** Capnogram samples are float32: 1e39 would be stored as Infinity. */
async function waveformProblems(db: Db): Promise<string[]> {
  const rows = (await db('waveformChunks').select('id', 'samples')) as {
    id: string;
    samples: Buffer;
  }[];
  return rows.flatMap((r) => {
    const copy = Buffer.from(r.samples);
    const values = new Float32Array(copy.buffer, copy.byteOffset, copy.byteLength / 4);
    const { min, max } = PLAUSIBLE.waveformMmHg;
    const bad = values.find((v) => !(v >= min && v <= max));
    return bad === undefined ? [] : [`waveform_chunks ${r.id}: sample ${bad}`];
  });
}

/** Entries outside [arrest − 1 h, arrest + 24 h] of their record. */
async function windowProblems(db: Db): Promise<string[]> {
  const out: string[] = [];
  for (const [table, col] of [
    ['resuscitation_events', 'at'],
    ['etco2_samples', 'at'],
    ['waveform_chunks', 'start_at'],
  ]) {
    const rows = (await db.raw(
      `select x.id from ${table} x join resuscitations r on r.id = x.resuscitation_id
       where x.${col} < r.arrest_at - interval '1 hour' or x.${col} > r.arrest_at + interval '24 hours'`,
    )) as { rows: { id: string }[] };
    out.push(...rows.rows.map((r) => `${table} ${r.id}: outside the record's window`));
  }
  return out;
}

/**
 * Every stored value no plausible input makes: non-finite or unsafe numbers, years outside
 * PLAUSIBLE.years, huge text, JSON nested too deep, entries outside their record's window.
 * Reads every table of the schema, so new tables are checked too.
 */
export async function storedHostile(db: Db): Promise<string[]> {
  const columns = (
    (await db.raw(
      `select table_name as "table", column_name as "column", data_type as "type"
       from information_schema.columns
       where table_schema = 'public' and table_name not like 'knex%'`,
    )) as { rows: Column[] }
  ).rows;
  const problems: string[] = [];
  for (const c of columns) {
    if (c.type === 'jsonb' || c.type === 'json') {
      const rows = (await db.raw(`select "${c.column}" as v from "${c.table}"`)) as {
        rows: { v: unknown }[];
      };
      for (const r of rows.rows) {
        const p = jsonProblem(r.v);
        if (p) problems.push(`${c.table}.${c.column}: ${p}`);
      }
      continue;
    }
    const where = hostileWhere(c);
    if (!where) continue;
    const n = (await db.raw(`select count(*)::int as n from "${c.table}" where ${where}`)) as {
      rows: { n: number }[];
    };
    if (n.rows[0].n > 0) problems.push(`${c.table}.${c.column}: ${n.rows[0].n} rows (${where})`);
  }
  return [...problems, ...(await waveformProblems(db)), ...(await windowProblems(db))];
}
