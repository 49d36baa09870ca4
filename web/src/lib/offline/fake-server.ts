import type { BatchResult, RecordingContext } from '@upstroke/contracts';
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
  clockSkewMs = 0;

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
}
