import type { BatchResult, DiscardRefused, RecordingContext } from '@upstroke/contracts';
import { ApiRequestError } from '../api-client';
import type { BatchKind, SyncTransport } from './transport';

/**
 * An in-memory API with the server's rules (idempotent create and batches), able to fail on
 * purpose: before storing (the request never arrived) or after storing (the answer was lost,
 * as when the API is killed mid-sync). Used by the outbox tests.
 */
export class FakeServer implements SyncTransport {
  readonly records = new Map<string, Record<string, unknown>>();
  readonly stored: Record<BatchKind, Map<string, object>> = {
    events: new Map(),
    etco2: new Map(),
    waveform: new Map(),
  };
  readonly calls: { kind: string; size: number; offset?: number }[] = [];
  /** Scripted failures for the next batch calls: 'before' or 'after' storing. */
  failures: ('before' | 'after' | null)[] = [];
  refuseIds = new Set<string>();
  /** A batch holding one of these answers 500 whole (an item that crashes the server). */
  poisonIds = new Set<string>();
  /** A batch holding one of these answers 400 whole, naming the item by its index. */
  namedRefusalIds = new Set<string>();
  /** Beyond this |clock offset| every batch answers 400 naming the header (as the API). */
  clockLimitMs = Infinity;
  clockSkewMs = 0;
  readonly discards: { id: string; body: DiscardRefused }[] = [];

  async context(): Promise<RecordingContext> {
    return { serverTime: new Date(Date.now() - this.clockSkewMs).toISOString(), sites: [] };
  }

  async create(body: Record<string, unknown>): Promise<void> {
    this.calls.push({ kind: 'create', size: 1 });
    if (!this.records.has(body.id as string)) this.records.set(body.id as string, body);
  }

  async patch(id: string, body: Record<string, unknown>): Promise<void> {
    const rec = this.records.get(id);
    if (!rec) throw new ApiRequestError(404, null);
    Object.assign(rec, body);
  }

  async batch(id: string, kind: BatchKind, items: object[], offset?: number): Promise<BatchResult> {
    this.calls.push({ kind, size: items.length, offset });
    const failure = this.failures.shift() ?? null;
    if (failure === 'before') throw new TypeError('Failed to fetch');
    if (!this.records.has(id)) throw new ApiRequestError(404, null);
    this.refuseWhole(items as { id: string }[], kind, offset);
    const result: BatchResult = { accepted: 0, duplicates: 0, rejected: [] };
    for (const item of items as { id: string }[]) {
      if (this.refuseIds.has(item.id)) result.rejected.push({ id: item.id, reason: 'value: bad' });
      else if (this.stored[kind].has(item.id)) result.duplicates++;
      else {
        this.stored[kind].set(item.id, item);
        result.accepted++;
      }
    }
    if (failure === 'after') throw new TypeError('Failed to fetch');
    return result;
  }

  async discard(id: string, body: DiscardRefused): Promise<void> {
    this.discards.push({ id, body });
  }

  private refuseWhole(items: { id: string }[], kind: BatchKind, offset?: number) {
    const fail = (status: number, path: string, message: string) =>
      new ApiRequestError(status, {
        statusCode: status,
        error: 'Error',
        message: `${path}: ${message}`,
        details: [{ path, message }],
      });
    if (offset !== undefined && Math.abs(offset) > this.clockLimitMs)
      throw fail(400, 'X-Clock-Offset-Ms', "check the tablet's date and time");
    if (items.some((i) => this.poisonIds.has(i.id))) throw fail(500, '(body)', 'crashed');
    const named = items.findIndex((i) => this.namedRefusalIds.has(i.id));
    const key = { events: 'events', etco2: 'samples', waveform: 'chunks' }[kind];
    if (named >= 0) throw fail(400, `${key}.${named}.data`, 'not storable');
  }
}
