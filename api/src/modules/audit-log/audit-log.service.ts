import { Injectable } from '@nestjs/common';
import type { AuditEntry, AuditQuery, List } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { AdminScopeService } from '../admin-scope/admin-scope.service';
import { AuditService } from '../audit/audit.service';
import { auditCsv } from './audit-csv';
import { type AuditFilter, AuditLogRepository, type AuditRow } from './audit-log.repository';

/** The most rows one export holds; narrow the filter for more. */
export const exportLimit = 50_000;

function toEntry(row: AuditRow): AuditEntry {
  return { ...row, at: row.at.toISOString() };
}

@Injectable()
export class AuditLogService {
  constructor(
    private readonly log: AuditLogRepository,
    private readonly scope: AdminScopeService,
    private readonly audit: AuditService,
  ) {}

  async list(admin: AuthUser, query: AuditQuery): Promise<List<AuditEntry>> {
    const { limit, offset, ...filter } = query;
    const scope = await this.scope.scopeOf(admin);
    const { items, total } = await this.log.list(filter, limit, offset, scope);
    return { items: items.map(toEntry), total };
  }

  async exportCsv(admin: AuthUser, filter: AuditFilter): Promise<string> {
    const scope = await this.scope.scopeOf(admin);
    const { items } = await this.log.list(filter, exportLimit, 0, scope);
    await this.audit.exported(
      admin.id,
      'csv',
      { entity: 'audit-log' },
      { filter, rows: items.length },
    );
    return auditCsv(items.map(toEntry));
  }

  vocabulary(): Promise<{ actions: string[]; entities: string[] }> {
    return this.log.vocabulary();
  }
}
