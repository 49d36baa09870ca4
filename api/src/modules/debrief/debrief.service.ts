import { Injectable } from '@nestjs/common';
import { analyze, etco2Series, resolveThresholds } from '@upstroke/capno';
import {
  type Debrief,
  type ProfileInput,
  thresholdDefaults,
  thresholdsSchema,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { ClinicalDataRepository } from '../resuscitations/clinical-data.repository';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access';
import type { ResuscitationRow } from '../resuscitations/resuscitations.repository';
import { toResuscitation } from '../resuscitations/resuscitations.service';
import {
  analysisEtco2,
  analysisEvents,
  assembleWaveform,
  debriefEvents,
  waveformTrace,
} from './analysis-input';
import { DebriefRepository, type ProfileRow } from './debrief.repository';

/** Thresholds stored in a profile, merged over the defaults and checked. */
function profileOf(row: ProfileRow | undefined): Debrief['profile'] {
  if (!row)
    return { id: null, version: null, name: 'Guideline defaults', thresholds: thresholdDefaults };
  const merged = resolveThresholds(row.thresholds as ProfileInput);
  const ok = thresholdsSchema.safeParse(merged);
  return {
    id: row.id,
    version: row.version,
    name: row.name,
    thresholds: ok.success ? ok.data : thresholdDefaults,
  };
}

/**
 * The debrief of one record: capno's analysis (never re-implemented here) on the stored
 * events, EtCO2 values and capnogram, with the protocol profile the record was made under.
 */
@Injectable()
export class DebriefService {
  constructor(
    private readonly access: ResuscitationAccess,
    private readonly data: ClinicalDataRepository,
    private readonly repo: DebriefRepository,
  ) {}

  async forUser(user: AuthUser, id: string): Promise<Debrief> {
    return this.build(await this.access.readable(user, id));
  }

  async build(record: ResuscitationRow): Promise<Debrief> {
    const id = record.id;
    const [events, etco2, chunks, context, profileRow, amendments] = await Promise.all([
      this.data.events(id),
      this.data.etco2(id),
      this.data.waveformChunks(id),
      this.repo.context(record),
      this.repo.profile(record.profileId, record.siteId),
      this.repo.amendments(id),
    ]);
    const arrestAt = record.arrestAt.toISOString();
    const profile = profileOf(profileRow);
    const waveform = assembleWaveform(chunks);
    const values = analysisEtco2(etco2);
    const output = analyze({
      arrestAt,
      profile: profile.thresholds,
      events: analysisEvents(events),
      etco2: values,
      waveform,
    });
    const { profileId: _p, ...header } = toResuscitation(record);
    return {
      ...output,
      record: { ...header, ...context },
      profile,
      // Entered and imported values with their source, then per-breath values (capno's merge).
      etco2Series: etco2Series(arrestAt, values, output.breaths),
      waveformTrace: waveformTrace(record.arrestAt, waveform, chunks[0]?.source ?? 'stream'),
      events: debriefEvents(record.arrestAt, events),
      amendments: amendments.map((a) => ({ ...a, createdAt: a.createdAt.toISOString() })),
      computedBy: 'server',
    };
  }
}
