import type { BatchResult, DiscardRefused, RecordingContext } from '@upstroke/contracts';
import { apiFetch, ApiRequestError } from '../api-client';

/** The answers' schemas (and zod), fetched on first use: see `wire-schemas.ts`. */
export const wireSchemas = () => import('./wire-schemas');

export type BatchKind = 'events' | 'etco2' | 'waveform';

/** What the outbox needs from the server; tests give a fake one. */
export interface SyncTransport {
  context(): Promise<RecordingContext>;
  create(body: Record<string, unknown>): Promise<void>;
  patch(id: string, body: Record<string, unknown>): Promise<void>;
  batch(
    id: string,
    kind: BatchKind,
    items: object[],
    clockOffsetMs: number | undefined,
  ): Promise<BatchResult>;
  /** Records on the server (audit) that a lead discarded refused entries, and why. */
  discard(id: string, body: DiscardRefused): Promise<void>;
}

const bodyKey: Record<BatchKind, string> = {
  events: 'events',
  etco2: 'samples',
  waveform: 'chunks',
};

/** A refusal that retrying will not change (400, 403, 404, 409, 422). */
export function isPermanent(error: unknown): boolean {
  return (
    error instanceof ApiRequestError &&
    error.status >= 400 &&
    error.status < 500 &&
    error.status !== 401 &&
    error.status !== 408 &&
    error.status !== 429
  );
}

export const apiTransport: SyncTransport = {
  context: async () =>
    apiFetch('/context', { schema: (await wireSchemas()).recordingContextSchema }),
  async create(body) {
    await apiFetch('/resuscitations', { method: 'POST', body });
  },
  async patch(id, body) {
    await apiFetch(`/resuscitations/${id}`, { method: 'PATCH', body });
  },
  async batch(id, kind, items, clockOffsetMs) {
    const headers: Record<string, string> =
      clockOffsetMs === undefined ? {} : { 'X-Clock-Offset-Ms': String(clockOffsetMs) };
    return apiFetch(`/resuscitations/${id}/${kind}/batch`, {
      method: 'POST',
      body: { [bodyKey[kind]]: items },
      headers,
      schema: (await wireSchemas()).batchResultSchema,
    });
  },
  async discard(id, body) {
    await apiFetch(`/resuscitations/${id}/discards`, {
      method: 'POST',
      body,
      schema: (await wireSchemas()).discardResultSchema,
    });
  },
};
