import { Injectable } from '@nestjs/common';
import type { Debrief, Waveform } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { ClinicalDataRepository } from '../resuscitations/clinical-data.repository';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access';
import type { ResuscitationRow } from '../resuscitations/resuscitations.repository';
import { toResuscitation } from '../resuscitations/resuscitations.service';
import { composeDebrief } from './compose-debrief';
import { DebriefRepository } from './debrief.repository';

/** Loads a record's rows and its protocol profile version, then composes the debrief. */
@Injectable()
export class DebriefService {
  constructor(
    private readonly access: ResuscitationAccess,
    private readonly data: ClinicalDataRepository,
    private readonly repo: DebriefRepository,
  ) {}

  async forUser(user: AuthUser, id: string): Promise<Debrief> {
    return (await this.build(await this.access.readable(user, id))).debrief;
  }

  /** The debrief and the assembled capnogram (the FHIR export carries it whole). */
  async withWaveform(
    user: AuthUser,
    id: string,
  ): Promise<{ debrief: Debrief; waveform?: Waveform }> {
    return this.build(await this.access.readable(user, id));
  }

  async build(record: ResuscitationRow): Promise<{ debrief: Debrief; waveform?: Waveform }> {
    const id = record.id;
    const [events, etco2, chunks, context, profile, amendments] = await Promise.all([
      this.data.events(id),
      this.data.etco2(id),
      this.data.waveformChunks(id),
      this.repo.context(record),
      this.repo.profile(record.profileId, record.siteId),
      this.repo.amendments(id),
    ]);
    const { profileId: _profileId, ...header } = toResuscitation(record);
    return composeDebrief({
      record: { ...header, ...context },
      profile,
      events,
      etco2,
      chunks,
      amendments,
    });
  }
}
