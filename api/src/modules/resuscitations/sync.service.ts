import { Injectable } from '@nestjs/common';
import type { BatchResult, DiscardRefused, DiscardResult } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditRepository } from '../audit/audit.repository';
import { ClinicalDataRepository } from './clinical-data.repository';
import { LiveFeed } from './live-feed';
import { ResuscitationAccess } from './resuscitation-access';
import { etco2Row, eventRow, type RowContext, type RowResult, waveformRow } from './sync-rows';

type Table = 'resuscitationEvents' | 'etco2Samples' | 'waveformChunks';

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
    private readonly data: ClinicalDataRepository,
    private readonly access: ResuscitationAccess,
    private readonly audit: AuditRepository,
    private readonly feed: LiveFeed,
  ) {}

  events(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'resuscitationEvents', eventRow);
  }

  etco2(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'etco2Samples', etco2Row);
  }

  waveform(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'waveformChunks', waveformRow);
  }

  /**
   * A lead gives up on entries the server refused: nothing is stored or deleted, the audit
   * log keeps who discarded what and why (the tablet keeps the entries, marked discarded).
   */
  async discard(user: AuthUser, id: string, body: DiscardRefused): Promise<DiscardResult> {
    await this.access.readable(user, id);
    await this.audit.insert({
      userId: user.id,
      action: 'discard-refused',
      entity: 'syncItems',
      resuscitationId: id,
      details: { reason: body.reason, items: body.items },
    });
    return { discarded: body.items.length };
  }

  private async ingest(
    user: AuthUser,
    id: string,
    items: unknown[],
    ctx: SyncContext,
    table: Table,
    toRow: (raw: unknown, c: RowContext) => RowResult,
  ): Promise<BatchResult> {
    const record = await this.access.writable(user, id);
    const c: RowContext = { ...ctx, user, recordId: id, arrestAt: record.arrestAt };
    const rejected: BatchResult['rejected'] = [];
    const rows: Record<string, unknown>[] = [];
    const seen = new Set<string>();
    items.forEach((raw, i) => {
      const result = toRow(raw, c);
      if ('error' in result) return rejected.push({ id: idOf(raw, i), reason: result.error });
      const { row } = result;
      if (seen.has(row.id as string)) return; // repeated inside one batch: a duplicate
      seen.add(row.id as string);
      rows.push(row);
    });
    const foreign = await this.data.idsOwnedElsewhere(
      table,
      rows.map((r) => r.id as string),
      id,
    );
    const own = rows.filter((r) => !foreign.has(r.id as string));
    for (const fid of foreign)
      rejected.push({ id: fid, reason: 'id: already used by another record' });
    const accepted = await this.data.insertNew(table, own);
    if (accepted < own.length) {
      // Another record may have taken an id between the look-up and the insert.
      const late = await this.data.idsOwnedElsewhere(table, [...seen], id);
      for (const fid of late)
        if (!foreign.has(fid))
          rejected.push({ id: fid, reason: 'id: already used by another record' });
    }
    // Other tablets showing this record hear at once (duplicates are harmless to them).
    if (accepted > 0) this.feed.publish(id, table, own);
    if (accepted > 0) {
      await this.audit.insert({
        userId: user.id,
        action: 'append',
        entity: table,
        resuscitationId: id,
        deviceId: ctx.deviceId,
        details: { accepted, clockOffsetMs: ctx.clockOffsetMs ?? null },
      });
    }
    return { accepted, duplicates: items.length - rejected.length - accepted, rejected };
  }
}
