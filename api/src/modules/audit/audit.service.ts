import { Injectable } from '@nestjs/common';
import type { Db } from '../../db/knex';
import { type AuditEntry, AuditRepository } from './audit.repository';

export type { AuditEntry };

/** Every module writes the audit trail through this service (its table stays private here). */
@Injectable()
export class AuditService {
  constructor(private readonly repo: AuditRepository) {}

  /** Appends one entry, inside the caller's transaction when one is given. */
  insert(entry: AuditEntry, trx?: Db): Promise<void> {
    return this.repo.insert(entry, trx);
  }

  /** An export leaving the app (PDF, FHIR, CSV), of one record or of a filtered list. */
  exported(
    userId: string,
    format: 'pdf' | 'fhir' | 'csv',
    target: { resuscitationId: string } | { entity: string },
    details: Record<string, unknown> = {},
  ): Promise<void> {
    return this.repo.exported(userId, format, target, details);
  }
}
