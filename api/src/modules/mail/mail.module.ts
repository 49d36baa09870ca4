import { Global, Module } from '@nestjs/common';
import { AdminScopeModule } from '../admin-scope/admin-scope.module';
import { AdminMailController } from './admin-mail.controller';
import { AdminMailService } from './admin-mail.service';
import { MailOutboxController } from './mail-outbox.controller';
import { MailSinkRepository } from './mail-sink.repository';
import { MailService } from './mail.service';
import { OutboxRepository } from './outbox.repository';
import { OutboxRetryWorker } from './outbox-retry.worker';

/**
 * Mail, in one place: the SMTP transport, the outbox (written before every send), the retry
 * worker and the admins' mail routes. Features only compose messages and call `MailService`.
 */
@Global()
@Module({
  imports: [AdminScopeModule],
  controllers: [AdminMailController, MailOutboxController],
  providers: [
    MailService,
    OutboxRepository,
    OutboxRetryWorker,
    MailSinkRepository,
    AdminMailService,
  ],
  exports: [MailService, OutboxRetryWorker],
})
export class MailModule {}
