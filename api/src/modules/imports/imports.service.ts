import { createHash, randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { Injectable } from '@nestjs/common';
import { alignClocks, eventsInForce } from '@upstroke/capno';
import type { List, MonitorImport } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { badRequest, conflict, DomainError, notFound } from '../../common/errors';
import type { Db } from '../../db/knex';
import { AuditService } from '../audit/audit.service';
import { ClinicalRecordsService } from '../resuscitations/clinical-records.service';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';
import { alignedEtco2, toMonitorImport } from './import-rows';
import { type ImportRow, ImportsRepository } from './imports.repository';
import {
  parseMonitorFile,
  type ParsedMonitorFile,
} from '../../common/monitor-file/parse-monitor-file';

export interface Upload {
  path: string;
  originalName: string;
  size: number;
}

async function sha256Of(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

const isUniqueViolation = (e: unknown) => (e as { code?: string } | null)?.code === '23505';

/**
 * Monitor file imports: the whole file is checked and stored in one transaction (any bad
 * line → nothing stored), its clock lined up with the record from shock markers, and the
 * chosen offset kept with who chose it. Stored sample times are always the aligned ones.
 */
@Injectable()
export class ImportsService {
  constructor(
    private readonly imports: ImportsRepository,
    private readonly data: ClinicalRecordsService,
    private readonly access: ResuscitationAccess,
    private readonly audit: AuditService,
  ) {}

  async list(user: AuthUser, id: string): Promise<List<MonitorImport>> {
    await this.access.readable(user, id);
    const items = (await this.imports.listByResuscitation(id)).map(toMonitorImport);
    return { items, total: items.length };
  }

  async importFile(user: AuthUser, id: string, upload?: Upload): Promise<MonitorImport> {
    await this.access.writable(user, id);
    if (!upload) throw badRequest('file: attach the monitor file as multipart field "file"');
    if (upload.size === 0) throw badRequest('file: the file is empty (0 bytes)');
    const sha256 = await sha256Of(upload.path);
    const earlier = await this.imports.findBySha(id, sha256);
    if (earlier) throw alreadyImported(earlier);
    const shocksSec = await this.recordedShocksSec(id);
    const importId = randomUUID();
    try {
      const row = await this.imports.transaction(async (trx) => {
        const meta = { resuscitationId: id, importId, recordedBy: user.id };
        const parsed = await parseMonitorFile(createReadStream(upload.path), (chunks) =>
          this.imports.insertChunks(chunks, meta, trx),
        );
        if (parsed.errors.length > 0) throw rejected(parsed, upload.originalName);
        return this.store(trx, { user, id, importId, parsed, sha256, upload, shocksSec });
      });
      return toMonitorImport(row);
    } catch (e) {
      if (isUniqueViolation(e)) throw conflict('This file was already imported on this record');
      throw e;
    }
  }

  /** The lead's chosen offset: samples move with it, and who chose it is kept. */
  async setOffset(user: AuthUser, id: string, importId: string, offsetSec: number) {
    await this.access.writable(user, id);
    const row = await this.imports.transaction(async (trx) => {
      const current = await this.imports.findById(id, importId, trx);
      if (!current) throw notFound('Import');
      // Aligned time = file time − offset, so a larger offset moves samples earlier.
      await this.imports.shiftSamples(importId, current.offsetSec - offsetSec, trx);
      const patch = {
        offsetSec,
        offsetMethod: 'manual' as const,
        offsetChosenBy: user.id,
        residualSec: null,
      };
      await this.imports.updateOffset(importId, patch, trx);
      await this.audit.insert(
        {
          userId: user.id,
          action: 'update',
          entity: 'import',
          entityId: importId,
          resuscitationId: id,
          details: { offsetSec: { from: current.offsetSec, to: offsetSec } },
        },
        trx,
      );
      return { ...current, ...patch };
    });
    return toMonitorImport(row);
  }

  /** Shock times of the record (capno's correction rule), in epoch seconds. */
  private async recordedShocksSec(id: string): Promise<number[]> {
    const rows = await this.data.events(id);
    return eventsInForce(rows.map((e) => ({ ...e, at: e.at.toISOString() })))
      .filter((e) => e.kind === 'shock')
      .map((e) => Date.parse(e.at) / 1000);
  }

  private async store(trx: Db, a: StoreArgs): Promise<ImportRow> {
    const p = a.parsed;
    const alignment = alignClocks(
      p.shockMarkersMs.map((ms) => ms / 1000),
      a.shocksSec,
    );
    const offsetSec = alignment?.offsetSec ?? 0;
    if (offsetSec !== 0) await this.imports.shiftSamples(a.importId, -offsetSec, trx);
    const etco2 = alignedEtco2(p.breaths, { fileStartMs: p.firstMs, offsetSec });
    const meta = { resuscitationId: a.id, importId: a.importId, recordedBy: a.user.id };
    await this.imports.insertEtco2(etco2, meta, trx);
    const row = await this.imports.insert(
      {
        id: a.importId,
        resuscitationId: a.id,
        fileName: a.upload.originalName.slice(0, 255),
        sha256: a.sha256,
        rows: p.rows,
        startedAt: new Date(p.firstMs),
        endedAt: new Date(p.lastMs),
        unit: p.unit ?? 'mmHg',
        sampleRateHz: p.sampleRateHz,
        offsetSec,
        offsetMethod: 'auto',
        offsetChosenBy: null,
        residualSec: alignment?.residualSec ?? null,
        markers: p.shockMarkersMs.length,
        matchedMarkers: alignment?.matched ?? 0,
        breaths: etco2.length,
        createdBy: a.user.id,
      },
      trx,
    );
    await this.audit.insert(
      {
        userId: a.user.id,
        action: 'import',
        entity: 'import',
        entityId: a.importId,
        resuscitationId: a.id,
        details: { fileName: row.fileName, rows: p.rows, offsetSec },
      },
      trx,
    );
    return row;
  }
}

interface StoreArgs {
  user: AuthUser;
  id: string;
  importId: string;
  parsed: ParsedMonitorFile;
  sha256: string;
  upload: Upload;
  shocksSec: number[];
}

function rejected(p: ParsedMonitorFile, fileName: string): DomainError {
  const first = p.errors[0];
  const more = p.errors.length > 1 ? ` (and ${p.errors.length - 1} more shown)` : '';
  return badRequest(
    `${fileName.slice(0, 80)} was not imported: line ${first.line}: ${first.message}${more}`,
    p.errors.map((e) => ({ path: `line ${e.line}`, message: e.message })),
  );
}

function alreadyImported(earlier: ImportRow): DomainError {
  return conflict(
    `Already imported: this file (${earlier.fileName}) was imported on ${earlier.createdAt.toISOString()} as import ${earlier.id}`,
  );
}
