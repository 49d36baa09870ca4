import { Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { DebriefModule } from '../debrief/debrief.module';
import { ExportsModule } from '../exports/exports.module';
import { DebriefMailController } from './debrief-mail.controller';
import { DebriefMailService } from './debrief-mail.service';
import { OutboxRepository } from './outbox.repository';
import { OutboxRetryWorker } from './outbox-retry.worker';

/** E-mailing the debrief, the admins' outbox list and the retry worker for queued mail. */
@Module({
  imports: [AdminScopeModule, DebriefModule, ExportsModule],
  controllers: [DebriefMailController],
  providers: [DebriefMailService, OutboxRepository, OutboxRetryWorker],
  exports: [OutboxRetryWorker],
})
export class DebriefMailModule {}
