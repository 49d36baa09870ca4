import { Module } from '@nestjs/common';
import { DebriefModule } from '../debrief/debrief.module';
import { ExportsModule } from '../exports/exports.module';
import { SiteContextModule } from '../site-context/site-context.module';
import { DebriefMailController } from './debrief-mail.controller';
import { DebriefMailService } from './debrief-mail.service';

/** E-mailing the debrief: composes the message; the mail module queues and sends it. */
@Module({
  imports: [DebriefModule, ExportsModule, SiteContextModule],
  controllers: [DebriefMailController],
  providers: [DebriefMailService],
})
export class DebriefMailModule {}
