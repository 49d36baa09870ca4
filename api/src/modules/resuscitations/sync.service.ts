import { Injectable } from '@nestjs/common';
import { toMmHg } from '@upstroke/capno';
import {
  type BatchResult,
  etco2SampleSchema,
  eventSchema,
  waveformChunkSchema,
} from '@upstroke/contracts';
import type { z } from 'zod';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditRepository } from '../audit/audit.repository';
import { ClinicalDataRepository } from './clinical-data.repository';
import { ResuscitationAccess } from './resuscitation-access';

type Table = 'resuscitationEvents' | 'etco2Samples' | 'waveformChunks';

export interface SyncContext {
  deviceId?: string;
  clockOffsetMs?: number;
}

function idOf(item: unknown, index: number): string {
  const id = (item as { id?: unknown } | null)?.id;
  return typeof id === 'string' ? id : `#${index}`;
}

function reasonOf(error: z.ZodError): string {
  const issue = error.issues[0];
  return issue ? `${issue.path.map(String).join('.') || 'item'}: ${issue.message}` : 'invalid';
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
  ) {}

  events(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'resuscitationEvents', (raw) => {
      const parsed = eventSchema.safeParse({ resuscitationId: id, ...(raw as object) });
      if (!parsed.success) return { error: reasonOf(parsed.error) };
      const e = parsed.data;
      if (e.resuscitationId !== id)
        return { error: 'resuscitationId: does not match the record in the address' };
      return {
        row: {
          id: e.id,
          resuscitationId: id,
          at: e.at,
          kind: e.kind,
          data: JSON.stringify(e.data),
          recordedBy: user.id,
          deviceId: e.deviceId ?? ctx.deviceId ?? null,
          clockOffsetMs: ctx.clockOffsetMs ?? null,
        },
      };
    });
  }

  etco2(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'etco2Samples', (raw) => {
      const parsed = etco2SampleSchema.safeParse(raw);
      if (!parsed.success) return { error: reasonOf(parsed.error) };
      const s = parsed.data;
      const valueMmhg = toMmHg(s.value, s.unit);
      if (valueMmhg > 150) return { error: 'value: above 150 mmHg' };
      return {
        row: {
          ...s,
          resuscitationId: id,
          valueMmhg,
          recordedBy: user.id,
          deviceId: s.deviceId ?? ctx.deviceId ?? null,
        },
      };
    });
  }

  waveform(user: AuthUser, id: string, items: unknown[], ctx: SyncContext): Promise<BatchResult> {
    return this.ingest(user, id, items, ctx, 'waveformChunks', (raw) => {
      const parsed = waveformChunkSchema.safeParse(raw);
      if (!parsed.success) return { error: reasonOf(parsed.error) };
      const c = parsed.data;
      const samples = Buffer.from(new Float32Array(c.values).buffer);
      return {
        row: {
          id: c.id,
          resuscitationId: id,
          startAt: c.startAt,
          sampleRateHz: c.sampleRateHz,
          unit: c.unit,
          seq: c.seq ?? null,
          sampleCount: c.values.length,
          samples,
          source: 'stream',
        },
      };
    });
  }

  private async ingest(
    user: AuthUser,
    id: string,
    items: unknown[],
    ctx: SyncContext,
    table: Table,
    toRow: (raw: unknown) => { row?: Record<string, unknown>; error?: string },
  ): Promise<BatchResult> {
    await this.access.writable(user, id);
    const rejected: BatchResult['rejected'] = [];
    const rows: Record<string, unknown>[] = [];
    const seen = new Set<string>();
    items.forEach((raw, i) => {
      const { row, error } = toRow(raw);
      if (!row) return rejected.push({ id: idOf(raw, i), reason: error ?? 'invalid' });
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
