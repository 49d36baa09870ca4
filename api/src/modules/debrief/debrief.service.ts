import { Injectable } from '@nestjs/common';
import type { Debrief, Waveform } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { notFound } from '../../common/errors';
import { ClinicalRecordsService } from '../resuscitations/clinical-records.service';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';
import type { ResuscitationRow } from '../resuscitations/clinical-records.service';
import { toResuscitation } from '../resuscitations/resuscitations.service';
import { type ComposeInput, type ReportOptions, WorkPool } from '../work-pool/work-pool.service';
import { DebriefRepository } from './debrief.repository';

/**
 * Loads the stored record (one loader), its header and the recorders' names; capno composes
 * the debrief in a worker (its analysis of a long record takes 100 ms and more).
 */
@Injectable()
export class DebriefService {
  constructor(
    private readonly access: ResuscitationAccess,
    private readonly data: ClinicalRecordsService,
    private readonly repo: DebriefRepository,
    private readonly pool: WorkPool,
  ) {}

  async forUser(user: AuthUser, id: string): Promise<Debrief> {
    const input = await this.input(await this.access.readable(user, id));
    return this.pool.run('debrief', ...input);
  }

  /** The debrief and the capnogram's runs (the FHIR export carries them whole). */
  async withWaveform(
    user: AuthUser,
    id: string,
  ): Promise<{ debrief: Debrief; waveform: Waveform[] }> {
    return this.pool.run('compose', ...(await this.input(await this.access.readable(user, id))));
  }

  /** The PDF report, composed and rendered in one worker task; the record names the file. */
  async report(
    user: AuthUser,
    id: string,
    opts: ReportOptions,
  ): Promise<{ file: Buffer; record: ComposeInput[1]['record'] }> {
    const input = await this.input(await this.access.readable(user, id));
    const bytes = await this.pool.run('recordReport', ...input, opts);
    return {
      file: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength),
      record: input[1].record,
    };
  }

  private async input(record: ResuscitationRow): Promise<ComposeInput> {
    const [stored, context, amendments] = await Promise.all([
      this.data.loadStored(record.id),
      this.repo.context(record),
      this.repo.amendments(record.id),
    ]);
    if (!stored) throw notFound('Resuscitation');
    const { profileId: _profileId, ...header } = toResuscitation(record);
    const names = await this.repo.userNames([
      ...new Set(stored.events.map((e) => e.recordedBy ?? null)),
    ]);
    return [
      stored,
      {
        record: { ...header, ...context },
        amendments: amendments.map((a) => ({ ...a, createdAt: a.createdAt.toISOString() })),
        computedBy: 'server',
      },
      [...names],
    ];
  }
}
