import { Controller, Get, Header, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuditEntry, type AuditQuery, auditQuerySchema, type List } from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { AuditLogService } from './audit-log.service';

const exportQuerySchema = auditQuerySchema.omit({ limit: true, offset: true });

/** Who did what to which record, when, and from which device. */
@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('audit')
export class AuditLogController {
  constructor(private readonly service: AuditLogService) {}

  @Get()
  list(
    @CurrentUser() admin: AuthUser,
    @Query(new ZodPipe(auditQuerySchema)) query: AuditQuery,
  ): Promise<List<AuditEntry>> {
    return this.service.list(admin, query);
  }

  @Get('export.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="upstroke-audit.csv"')
  exportCsv(
    @CurrentUser() admin: AuthUser,
    @Query(new ZodPipe(exportQuerySchema)) query: Omit<AuditQuery, 'limit' | 'offset'>,
  ): Promise<string> {
    return this.service.exportCsv(admin, query);
  }

  @Get('vocabulary')
  vocabulary(): Promise<{ actions: string[]; entities: string[] }> {
    return this.service.vocabulary();
  }
}
