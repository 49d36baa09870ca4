import { Injectable } from '@nestjs/common';
import type { AuditEntry, AuditQuery, List } from '@upstroke/contracts';
import { auditCsv } from './audit-csv';
import { type AuditFilter, AuditLogRepository, type AuditRow } from './audit-log.repository';

/** The most rows one export holds; narrow the filter for more. */
export const exportLimit = 50_000;

function toEntry(row: AuditRow): AuditEntry {
  return { ...row, at: row.at.toISOString() };
}

@Injectable()
export class AuditLogService {
  constructor(private readonly log: AuditLogRepository) {}

  async list(query: AuditQuery): Promise<List<AuditEntry>> {
    const { limit, offset, ...filter } = query;
    const { items, total } = await this.log.list(filter, limit, offset);
    return { items: items.map(toEntry), total };
  }

  async exportCsv(filter: AuditFilter): Promise<string> {
    const { items } = await this.log.list(filter, exportLimit, 0);
    return auditCsv(items.map(toEntry));
  }

  vocabulary(): Promise<{ actions: string[]; entities: string[] }> {
    return this.log.vocabulary();
  }
}
