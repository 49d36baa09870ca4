import { Injectable } from '@nestjs/common';
import type { Debrief, Waveform } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { notFound } from '../../common/errors';
import { ClinicalRecordsService } from '../resuscitations/clinical-records.service';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';
import type { ResuscitationRow } from '../resuscitations/clinical-records.service';
import { toResuscitation } from '../resuscitations/resuscitations.service';
import { WorkPool } from '../work-pool/work-pool.service';
import { DebriefRepository } from './debrief.repository';

/** Loads the stored record (one loader) and its header; capno composes the debrief (in a worker). */
@Injectable()
export class DebriefService {
  constructor(
    private readonly access: ResuscitationAccess,
    private readonly data: ClinicalRecordsService,
    private readonly repo: DebriefRepository,
    private readonly pool: WorkPool,
  ) {}

  async forUser(user: AuthUser, id: string): Promise<Debrief> {
    return (await this.build(await this.access.readable(user, id))).debrief;
  }

  /** The debrief and the capnogram's runs (the FHIR export carries them whole). */
  async withWaveform(
    user: AuthUser,
    id: string,
  ): Promise<{ debrief: Debrief; waveform: Waveform[] }> {
    return this.build(await this.access.readable(user, id));
  }

  async build(record: ResuscitationRow): Promise<{ debrief: Debrief; waveform: Waveform[] }> {
    const [stored, context, amendments] = await Promise.all([
      this.data.loadStored(record.id),
      this.repo.context(record),
      this.repo.amendments(record.id),
    ]);
    if (!stored) throw notFound('Resuscitation');
    const { profileId: _profileId, ...header } = toResuscitation(record);
    // capno's analysis of a long record takes 100 ms and more: off the event loop.
    const composed = await this.pool.run('compose', stored, {
      record: { ...header, ...context },
      amendments: amendments.map((a) => ({ ...a, createdAt: a.createdAt.toISOString() })),
      computedBy: 'server',
    });
    const names = await this.repo.userNames([
      ...new Set(stored.events.map((e) => e.recordedBy ?? null)),
    ]);
    for (const e of composed.debrief.events)
      e.recordedByName = e.recordedBy ? (names.get(e.recordedBy) ?? null) : null;
    return composed;
  }
}
