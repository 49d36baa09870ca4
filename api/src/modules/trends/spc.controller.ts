import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type ControlChartQuery,
  controlChartQuerySchema,
  type FunnelQuery,
  funnelQuerySchema,
} from '@upstroke/contracts';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { ControlChartService } from './control-chart.service';
import { FunnelService } from './funnel.service';

/** Control charts and funnel plots over the same scoped records as the trends series. */
@ApiTags('trends')
@ApiBearerAuth()
@Roles('quality', 'admin', 'lead')
@Controller('trends')
export class SpcController {
  constructor(
    private readonly charts: ControlChartService,
    private readonly funnels: FunnelService,
  ) {}

  @Get('control-chart')
  controlChart(
    @CurrentUser() user: AuthUser,
    @Query(new ZodPipe(controlChartQuerySchema)) q: ControlChartQuery,
  ) {
    return this.charts.chart(user, q);
  }

  @Get('funnel')
  funnel(@CurrentUser() user: AuthUser, @Query(new ZodPipe(funnelQuerySchema)) q: FunnelQuery) {
    return this.funnels.funnel(user, q);
  }
}
