import { Global, Module } from '@nestjs/common';
import { MailOutboxRepository } from './mail-outbox.repository';
import { MailService } from './mail.service';

@Global()
@Module({ providers: [MailOutboxRepository, MailService], exports: [MailService] })
export class MailModule {}
