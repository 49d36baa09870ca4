import { Module } from '@nestjs/common';
import { ResuscitationsModule } from '../resuscitations/resuscitations.module';
import { SummariesModule } from '../summaries/summaries.module';
import { DebriefController } from './debrief.controller';
import { DebriefRepository } from './debrief.repository';
import { DebriefService } from './debrief.service';
import { SigningService } from './signing.service';

/** Debrief analysis, signing and amendments; exports the debrief for the chart exports. */
@Module({
  imports: [ResuscitationsModule, SummariesModule],
  controllers: [DebriefController],
  providers: [DebriefRepository, DebriefService, SigningService],
  exports: [DebriefService, DebriefRepository],
})
export class DebriefModule {}
