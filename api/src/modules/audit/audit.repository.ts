import { Inject, Injectable } from '@nestjs/common';
import { KNEX, type Db } from '../../db/knex';

export interface AuditEntry {
  userId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  resuscitationId?: string | null;
  deviceId?: string | null;
  details?: Record<string, unknown>;
}

/** Append-only trail of who did what to which record, when and from which device. */
@Injectable()
export class AuditRepository {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  async insert(entry: AuditEntry, trx?: Db): Promise<void> {
    await (trx ?? this.db)('auditLog').insert({
      ...entry,
      details: JSON.stringify(entry.details ?? {}),
    });
  }

  /**
   * An export leaving the app (PDF, FHIR, CSV) as `export.<format>`: of one record, or of a
   * filtered list (`entity` names the list, `details` its filter).
   */
  exported(
    userId: string,
    format: 'pdf' | 'fhir' | 'csv',
    target: { resuscitationId: string } | { entity: string },
    details: Record<string, unknown> = {},
  ): Promise<void> {
    const one = 'resuscitationId' in target ? target.resuscitationId : null;
    return this.insert({
      userId,
      action: `export.${format}`,
      entity: one ? 'resuscitation' : (target as { entity: string }).entity,
      entityId: one,
      resuscitationId: one,
      details,
    });
  }
}
