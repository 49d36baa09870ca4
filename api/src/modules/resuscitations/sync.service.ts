import { Injectable } from '@nestjs/common';
import type { BatchResult, DiscardRefused, DiscardResult } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditService } from '../audit/audit.service';
import { type EntryMeta, EntriesRepository, type EntryTable } from './entries.repository';
import { LiveFeed } from './live-feed';
import { ResuscitationAccess } from './resuscitation-access.service';
import { etco2Row, eventRow, type RowContext, type RowResult, waveformRow } from './sync-rows';

/** One kind of entry: its table, how an item is checked, how valid ones are stored. */
interface EntryKind<T extends { id: string }> {
  table: EntryTable;
  check: (raw: unknown, c: RowContext) => RowResult<T>;
  insert: (items: T[], meta: EntryMeta) => Promise<number>;
  /** Tells the record's other tablets (events and EtCO2 values; not the capnogram). */
  publish?: (id: string, items: T[], device: string | null) => void;
}

export interface SyncContext {
  deviceId?: string;
  clockOffsetMs?: number;
}

function idOf(item: unknown, index: number): string {
  const id = (item as { id?: unknown } | null)?.id;
  return typeof id === 'string' ? id : `#${index}`;
}

/**
 * Idempotent batch uploads from tablets. Valid items are stored, invalid ones are named with
 * their reason, and replays of stored ids count as duplicates and change nothing.
 */
@Injectable()
export class SyncService {
  constructor(
    private readonly entries: EntriesRepository,
    private readonly access: ResuscitationAccess,
    private readonly audit: AuditService,
    private readonly feed: LiveFeed,
  ) {}

  events(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, {
      table: 'resuscitationEvents',
      check: eventRow,
      insert: (events, meta) => this.entries.insertEvents(events, meta),
      publish: (rid, events, device) => this.feed.publishEvents(rid, events, device),
    });
  }

  etco2(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, {
      table: 'etco2Samples',
      check: etco2Row,
      insert: (values, meta) => this.entries.insertEtco2(values, meta),
      publish: (rid, values, device) => this.feed.publishEtco2(rid, values, device),
    });
  }

  waveform(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, {
      table: 'waveformChunks',
      check: waveformRow,
      insert: (chunks, meta) => this.entries.insertWaveform(chunks, meta),
    });
  }

  /**
   * A lead gives up on entries the server refused (or held back behind a refused start):
   * nothing is stored or deleted; the audit log keeps who discarded what (each entry's
   * content and the server's reason) and why. Works for a record the server never received.
   */
  async discard(user: AuthUser, id: string, body: DiscardRefused): Promise<DiscardResult> {
    const { siteId, onServer } = await this.access.discardSite(user, id, body.siteId);
    await this.audit.insert({
      userId: user.id,
      action: 'discard-refused',
      entity: 'syncItems',
      resuscitationId: id,
      details: { reason: body.reason, siteId, recordOnServer: onServer, items: body.items },
    });
    return { discarded: body.items.length };
  }

  private async ingest<T extends { id: string }>(
    user: AuthUser,
    id: string,
    items: unknown[],
    ctx: SyncContext,
    kind: EntryKind<T>,
  ): Promise<BatchResult> {
    const record = await this.access.writable(user, id);
    const c: RowContext = { recordId: id, arrestAt: record.arrestAt };
    const rejected: BatchResult['rejected'] = [];
    const valid: T[] = [];
    const seen = new Set<string>();
    items.forEach((raw, i) => {
      const result = kind.check(raw, c);
      if ('error' in result) return rejected.push({ id: idOf(raw, i), reason: result.error });
      const { value } = result;
      if (seen.has(value.id)) return; // repeated inside one batch: a duplicate
      seen.add(value.id);
      valid.push(value);
    });
    const foreign = await this.entries.idsOwnedElsewhere(
      kind.table,
      valid.map((v) => v.id),
      id,
    );
    const own = valid.filter((v) => !foreign.has(v.id));
    for (const fid of foreign)
      rejected.push({ id: fid, reason: 'id: already used by another record' });
    const meta = { resuscitationId: id, recordedBy: user.id, ...ctx };
    const accepted = await kind.insert(own, meta);
    if (accepted < own.length) {
      // Another record may have taken an id between the look-up and the insert.
      const late = await this.entries.idsOwnedElsewhere(kind.table, [...seen], id);
      for (const fid of late)
        if (!foreign.has(fid))
          rejected.push({ id: fid, reason: 'id: already used by another record' });
    }
    if (accepted > 0) await this.afterAppend(user, id, ctx, kind, own, accepted);
    return { accepted, duplicates: items.length - rejected.length - accepted, rejected };
  }

  private async afterAppend<T extends { id: string }>(
    user: AuthUser,
    id: string,
    ctx: SyncContext,
    kind: EntryKind<T>,
    own: T[],
    accepted: number,
  ): Promise<void> {
    // Other tablets showing this record hear at once (duplicates are harmless to them).
    kind.publish?.(id, own, ctx.deviceId ?? null);
    await this.audit.insert({
      userId: user.id,
      action: 'append',
      entity: kind.table,
      resuscitationId: id,
      deviceId: ctx.deviceId,
      details: { accepted, clockOffsetMs: ctx.clockOffsetMs ?? null },
    });
  }
}
