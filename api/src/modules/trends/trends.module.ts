import { Module } from '@nestjs/common';
import { ControlChartService } from './control-chart.service';
import { FunnelService } from './funnel.service';
import { SpcController } from './spc.controller';
import { SpcRepository } from './spc.repository';
import { TrendsController } from './trends.controller';
import { TrendsRepository } from './trends.repository';
import { TrendsService } from './trends.service';
import { UtsteinService } from './utstein.service';

@Module({
  controllers: [TrendsController, SpcController],
  providers: [
    TrendsRepository,
    TrendsService,
    UtsteinService,
    SpcRepository,
    ControlChartService,
    FunnelService,
  ],
  exports: [TrendsService, UtsteinService, ControlChartService, FunnelService],
})
export class TrendsModule {}
