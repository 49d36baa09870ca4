import { Module } from '@nestjs/common';
import { ExportsModule } from '../exports/exports.module';
import { CommitteeReportController } from './committee-report.controller';
import { CommitteeReportRepository } from './committee-report.repository';
import { CommitteeReportService } from './committee-report.service';
import { ControlChartService } from './control-chart.service';
import { FunnelService } from './funnel.service';
import { SpcController } from './spc.controller';
import { SpcRepository } from './spc.repository';
import { TrendsController } from './trends.controller';
import { TrendsRepository } from './trends.repository';
import { TrendsService } from './trends.service';
import { UtsteinService } from './utstein.service';

@Module({
  imports: [ExportsModule],
  controllers: [TrendsController, SpcController, CommitteeReportController],
  providers: [
    TrendsRepository,
    TrendsService,
    UtsteinService,
    SpcRepository,
    ControlChartService,
    FunnelService,
    CommitteeReportRepository,
    CommitteeReportService,
  ],
  exports: [
    TrendsService,
    UtsteinService,
    ControlChartService,
    FunnelService,
    CommitteeReportService,
  ],
})
export class TrendsModule {}
