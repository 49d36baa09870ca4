import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import {
  type Amendment,
  type CreateAmendment,
  entryTimeProblem,
  eventSchema,
  replacementProblem,
  type Resuscitation,
  type ResusEvent,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { badRequest, conflict, forbidden } from '../../common/errors';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service';
import {
  ClinicalRecordsService,
  type ResuscitationRow,
} from '../resuscitations/clinical-records.service';
import { ResuscitationAccess } from '../resuscitations/resuscitation-access.service';
import { toResuscitation } from '../resuscitations/resuscitations.service';
import { SummariesService } from '../summaries/summaries.service';
import { DebriefRepository } from './debrief.repository';

/** Utstein core closing details the lead must fill in before signing (Nolan 2019). */
const requiredToSign = ['outcome', 'firstRhythm', 'witnessed', 'monitored'] as const;

function assertClosingDetails(record: ResuscitationRow): void {
  const missing = requiredToSign.filter((f) => record[f] === null || record[f] === undefined);
  if (missing.length > 0) {
    throw badRequest(
      `${missing.join(', ')}: complete the closing details before signing`,
      missing.map((path) => ({ path, message: 'Required before signing' })),
    );
  }
}

/**
 * Signing locks a record; afterwards it changes only through amendments with a reason.
 * The database enforces the lock too (migration 20261202003001); these rules give the
 * clear 4xx answers.
 */
@Injectable()
export class SigningService {
  constructor(
    private readonly access: ResuscitationAccess,
    private readonly records: ClinicalRecordsService,
    private readonly repo: DebriefRepository,
    private readonly audit: AuditService,
    private readonly summaries: SummariesService,
  ) {}

  private async leadRecord(user: AuthUser, id: string): Promise<ResuscitationRow> {
    const record = await this.access.readable(user, id);
    if (user.role !== 'lead') throw forbidden('Only the lead signs and amends records');
    return record;
  }

  /**
   * Signs under the record's row lock: entries still being written finish first, later
   * ones are refused by the lock triggers, and the summary row sees exactly what was signed.
   */
  async sign(user: AuthUser, id: string, deviceId?: string): Promise<Resuscitation> {
    await this.leadRecord(user, id);
    await this.repo.transaction(async (trx) => {
      const record = (await this.records.lockById(id, trx)) as ResuscitationRow;
      if (record.status === 'signed') throw conflict('This record is already signed');
      assertClosingDetails(record);
      if (!(await this.repo.markSigned(id, user.id, trx)))
        throw conflict('This record is already signed');
      await this.audit.insert(
        {
          userId: user.id,
          action: 'sign',
          entity: 'resuscitation',
          entityId: id,
          resuscitationId: id,
          deviceId,
        },
        trx,
      );
      await this.summaries.write(id, trx);
    });
    return toResuscitation((await this.records.findById(id)) as ResuscitationRow);
  }

  async amend(
    user: AuthUser,
    id: string,
    body: CreateAmendment,
    deviceId?: string,
  ): Promise<Amendment> {
    const record = await this.leadRecord(user, id);
    if (record.status !== 'signed')
      throw conflict('This record is not signed yet: edit it directly instead of amending');
    const events = this.validEvents(record, body.events ?? []);
    const fields = body.fields ?? {};
    if (fields.unitId && !(await this.records.unitBelongsToSite(fields.unitId, record.siteId)))
      throw badRequest('fields.unitId: this unit is not part of the site', [
        { path: 'fields.unitId', message: 'Unknown unit for this site' },
      ]);
    const amendmentId = randomUUID();
    await this.repo.transaction(async (trx) => {
      // One amendment at a time per record: both would otherwise hold the row in share mode
      // (lock triggers) and deadlock when they update it.
      await this.records.lockById(id, trx);
      // The amendment row comes first: the lock triggers let through only changes made in
      // the same transaction as an amendment of this record.
      await this.repo.insertAmendment(
        {
          id: amendmentId,
          resuscitationId: id,
          reason: body.reason,
          fields,
          eventIds: events.map((e) => e.id),
          createdBy: user.id,
        },
        trx,
      );
      const meta = { resuscitationId: id, recordedBy: user.id, deviceId, amendmentId };
      if ((await this.records.insertEvents(events, meta, trx)) !== events.length)
        throw conflict('An event with one of these ids already exists');
      if (Object.keys(fields).length > 0) await this.records.amendFields(id, fields, trx);
      await this.auditAmendment(user, id, amendmentId, body, deviceId, trx);
      await this.summaries.write(id, trx);
    });
    const stored = (await this.repo.amendments(id)).find((a) => a.id === amendmentId);
    if (!stored) throw conflict('The amendment was not stored');
    return { ...stored, createdAt: stored.createdAt.toISOString() };
  }

  /**
   * Each added event must pass the same schema as a recorded one; a correction's replacement
   * must be valid for its kind and fall within the record's plausible window (arrest − 1 h to
   * arrest + 24 h). All or nothing.
   */
  private validEvents(
    record: ResuscitationRow,
    events: NonNullable<CreateAmendment['events']>,
  ): ResusEvent[] {
    return events.map((raw, i) => {
      const refuse = (path: string, message: string) =>
        badRequest(`${path}: ${message}`, [{ path, message }]);
      const parsed = eventSchema.safeParse({ ...raw, resuscitationId: record.id });
      if (!parsed.success) {
        const issue = parsed.error.issues[0];
        throw refuse(`events.${i}.${issue.path.map(String).join('.')}`, issue.message);
      }
      const unfit = replacementProblem(parsed.data);
      if (unfit) {
        const [path, message] = unfit.split(/: (.*)/s);
        throw refuse(`events.${i}.${path}`, message);
      }
      const at = (parsed.data.data as { replacement?: { at: string } }).replacement?.at;
      const late = at ? entryTimeProblem(at, record.arrestAt) : null;
      if (late) throw refuse(`events.${i}.data.replacement.at`, late);
      return parsed.data;
    });
  }

  private async auditAmendment(
    user: AuthUser,
    id: string,
    amendmentId: string,
    body: CreateAmendment,
    deviceId: string | undefined,
    trx: Knex.Transaction,
  ): Promise<void> {
    await this.audit.insert(
      {
        userId: user.id,
        action: 'amend',
        entity: 'resuscitation',
        entityId: amendmentId,
        resuscitationId: id,
        deviceId,
        details: {
          reason: body.reason,
          fields: Object.keys(body.fields ?? {}),
          eventIds: (body.events ?? []).map((e) => e.id),
        },
      },
      trx,
    );
  }
}
