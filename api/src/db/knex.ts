import knex, { type Knex } from 'knex';
import { types } from 'pg';

export const KNEX = Symbol('KNEX');
export type Db = Knex;

// bigint counts and ids come back as numbers where they fit (audit ids, count(*)).
types.setTypeParser(20, (v) => Number(v));
// numeric (percentiles, averages) as numbers.
types.setTypeParser(1700, (v) => Number(v));

const toSnake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const toCamel = (s: string) => s.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());

function camelRow(row: unknown): unknown {
  if (!row || typeof row !== 'object' || row instanceof Date || Buffer.isBuffer(row)) return row;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(row)) out[toCamel(k)] = v;
  return out;
}

/**
 * Knex with camelCase in TypeScript and snake_case in PostgreSQL: identifiers are converted
 * on the way in, top-level row keys on the way out (JSON column contents are left alone).
 */
export function createKnex(databaseUrl: string, poolMax = 10): Knex {
  return knex({
    client: 'pg',
    connection: databaseUrl,
    pool: { min: 0, max: poolMax },
    wrapIdentifier: (value, origImpl) => origImpl(value === '*' ? value : toSnake(value)),
    postProcessResponse: (result: unknown) =>
      Array.isArray(result) ? result.map(camelRow) : camelRow(result),
  });
}
