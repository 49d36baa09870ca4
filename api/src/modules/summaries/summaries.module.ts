import { Module } from '@nestjs/common';
import { ResuscitationsModule } from '../resuscitations/resuscitations.module';
import { SummariesRepository } from './summaries.repository';
import { SummariesService } from './summaries.service';

/** Per-record summary rows (`record_summaries`) for trends; no routes of its own. */
@Module({
  imports: [ResuscitationsModule],
  providers: [SummariesRepository, SummariesService],
  exports: [SummariesService],
})
export class SummariesModule {}
