import { Module } from '@nestjs/common';
import { ResuscitationsModule } from '../resuscitations/resuscitations.module';
import { DebriefController } from './debrief.controller';
import { DebriefRepository } from './debrief.repository';
import { DebriefService } from './debrief.service';
import { SigningService } from './signing.service';
import { SummaryHook } from './summary-hook';

/** Debrief analysis, signing and amendments; exports the debrief for the chart exports. */
@Module({
  imports: [ResuscitationsModule],
  controllers: [DebriefController],
  providers: [DebriefRepository, DebriefService, SigningService, SummaryHook],
  exports: [DebriefService, DebriefRepository],
})
export class DebriefModule {}
