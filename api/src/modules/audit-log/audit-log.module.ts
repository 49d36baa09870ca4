import { Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { AuditLogController } from './audit-log.controller';
import { AuditLogRepository } from './audit-log.repository';
import { AuditLogService } from './audit-log.service';

@Module({
  imports: [AdminScopeModule],
  controllers: [AuditLogController],
  providers: [AuditLogRepository, AuditLogService],
})
export class AuditLogModule {}
