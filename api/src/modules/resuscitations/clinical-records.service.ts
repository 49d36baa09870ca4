import { Injectable } from '@nestjs/common';
import type { StoredRecord } from '@upstroke/capno';
import type { CreateAmendment, ResusEvent } from '@upstroke/contracts';
import type { Db } from '../../db/knex';
import { ClinicalDataRepository, type EventRow } from './clinical-data.repository';
import { type EntryMeta, EntriesRepository } from './entries.repository';
import { type ResuscitationRow, ResuscitationsRepository } from './resuscitations.repository';

export type { EntryMeta, EventRow, ResuscitationRow };
export type AmendedFields = NonNullable<CreateAmendment['fields']>;

/**
 * The stored record as other modules reach it (debrief, signing, imports, the committee's
 * row): the one loader, the record row under lock, amendment writes. Its tables stay private
 * to this module.
 */
@Injectable()
export class ClinicalRecordsService {
  constructor(
    private readonly records: ResuscitationsRepository,
    private readonly data: ClinicalDataRepository,
    private readonly entries: EntriesRepository,
  ) {}

  /** Everything every output is composed from (see `ClinicalDataRepository.loadStored`). */
  loadStored(id: string, trx?: Db): Promise<StoredRecord | undefined> {
    return this.data.loadStored(id, trx);
  }

  events(id: string): Promise<EventRow[]> {
    return this.data.events(id);
  }

  findById(id: string, trx?: Db): Promise<ResuscitationRow | undefined> {
    return this.records.findById(id, trx);
  }

  /** The record with its row locked until `trx` ends (no entry commits meanwhile). */
  lockById(id: string, trx: Db): Promise<ResuscitationRow | undefined> {
    return this.records.lockById(id, trx);
  }

  unitBelongsToSite(unitId: string, siteId: string): Promise<boolean> {
    return this.records.unitBelongsToSite(unitId, siteId);
  }

  /** An amendment's changed closing details (validated by its contract). */
  amendFields(id: string, fields: AmendedFields, trx: Db): Promise<void> {
    return this.records.update(id, fields, trx);
  }

  /** Events added by an amendment; returns how many were new. */
  insertEvents(events: readonly ResusEvent[], meta: EntryMeta, trx?: Db): Promise<number> {
    return this.entries.insertEvents(events, meta, trx);
  }
}
