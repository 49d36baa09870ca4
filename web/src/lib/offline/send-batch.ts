import type { BatchResult } from '@upstroke/contracts';
import { ApiRequestError } from '../api-client';
import { isPermanent } from './transport';

/** The header the server names when it refuses the tablet's clock (api clock-offset.ts). */
export const CLOCK_OFFSET_HEADER = 'X-Clock-Offset-Ms';

/** The server refused this tablet's clock: nothing was stored; the entries wait for a fix. */
export class ClockRefusedError extends Error {}

/**
 * The refusal the recorder reads for a tablet `offsetMs` off the server's clock (tablet minus
 * server), with what it stops (`because`, e.g. ", so the code's start would be refused").
 */
export function clockRefusal(offsetMs: number, because = ''): ClockRefusedError {
  const hours = Math.max(1, Math.round(Math.abs(offsetMs) / 3_600_000));
  return new ClockRefusedError(
    `This tablet's clock is ${hours} h ${offsetMs > 0 ? 'ahead of' : 'behind'} the server's${because}: check the tablet's date and time. Entries are kept on the tablet.`,
  );
}

export function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function isClockRefusal(e: unknown): boolean {
  return (
    e instanceof ApiRequestError &&
    e.status === 400 &&
    Boolean(e.body?.details?.some((d) => d.path === CLOCK_OFFSET_HEADER))
  );
}

const isServerError = (e: unknown) => e instanceof ApiRequestError && e.status >= 500;
/** Refusals about the record itself (access, absent, signed): every item shares them. */
const isRecordLevel = (e: unknown) =>
  e instanceof ApiRequestError && [403, 404, 409].includes(e.status);

/** Items a 4xx answer names by index (`events.3.data.text`), with the message. */
function namedItems(e: unknown, rows: { id: string }[]): Map<string, string> {
  const named = new Map<string, string>();
  if (!(e instanceof ApiRequestError)) return named;
  for (const d of e.body?.details ?? []) {
    const m = /^(?:events|samples|chunks)\.(\d+)\b/.exec(d.path);
    const row = m ? rows[Number(m[1])] : undefined;
    if (row && !named.has(row.id)) named.set(row.id, `${d.path}: ${d.message}`);
  }
  return named;
}

const halves = <T>(rows: T[]): [T[], T[]] => {
  const mid = Math.ceil(rows.length / 2);
  return [rows.slice(0, mid), rows.slice(mid)];
};

/** What one chunk's delivery found out; `serverError` is the last 5xx seen, if any. */
export interface Delivery<R extends { id: string }> {
  send: (rows: R[]) => Promise<BatchResult>;
  /** The server's verdicts: null = stored (or already stored), a string = refused, why. */
  verdicts: Map<string, string | null>;
  serverError: unknown;
}

/**
 * Sends `rows` and records a verdict for each; returns the rows left without one (the server
 * failed with 5xx). A 4xx naming items refuses those and sends the rest; a 4xx naming none is
 * narrowed down by halves; a 403/404/409 refuses all. With `bisect` (the same batch has kept
 * failing), a 5xx batch is split so that one poison item cannot hold the others back.
 * Network failures, 401/408/429 and a refused clock are thrown: everything stays queued.
 */
export async function deliver<R extends { id: string }>(
  rows: R[],
  bisect: boolean,
  d: Delivery<R>,
): Promise<R[]> {
  try {
    const result = await d.send(rows);
    const refused = new Map(result.rejected.map((r) => [r.id, r.reason]));
    for (const r of rows) d.verdicts.set(r.id, refused.get(r.id) ?? null);
    return [];
  } catch (e) {
    if (isClockRefusal(e)) throw new ClockRefusedError(messageOf(e));
    if (isServerError(e)) {
      d.serverError = e;
      return bisect && rows.length > 1 ? splitAfterServerError(rows, d) : rows;
    }
    if (!isPermanent(e)) throw e;
    return refuse(rows, e, bisect, d);
  }
}

async function refuse<R extends { id: string }>(
  rows: R[],
  e: unknown,
  bisect: boolean,
  d: Delivery<R>,
): Promise<R[]> {
  const named = namedItems(e, rows);
  if (named.size > 0) {
    for (const [id, reason] of named) d.verdicts.set(id, reason);
    const rest = rows.filter((r) => !named.has(r.id));
    return rest.length ? deliver(rest, bisect, d) : [];
  }
  if (isRecordLevel(e) || rows.length === 1) {
    for (const r of rows) d.verdicts.set(r.id, messageOf(e));
    return [];
  }
  const [a, b] = halves(rows);
  return [...(await deliver(a, bisect, d)), ...(await deliver(b, bisect, d))];
}

/**
 * After a 5xx: both halves are tried once; the failing half is split again. When both fail
 * the first is narrowed and the second waits for the next drain, so a server that is down
 * costs about two requests per halving, not one per item.
 */
async function splitAfterServerError<R extends { id: string }>(
  rows: R[],
  d: Delivery<R>,
): Promise<R[]> {
  const [a, b] = halves(rows);
  const leftA = await deliver(a, false, d);
  const leftB = await deliver(b, false, d);
  if (leftA.length > 1) return [...(await splitAfterServerError(leftA, d)), ...leftB];
  if (leftB.length > 1 && leftA.length === 0) return splitAfterServerError(leftB, d);
  return [...leftA, ...leftB];
}
