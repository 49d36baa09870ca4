import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type CommitteeReportQuery, committeeReportQuerySchema } from '@upstroke/contracts';
import type { Response } from 'express';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { CommitteeReportService } from './committee-report.service';

/** The monthly committee report as a PDF, for any month, with the Trends filters. */
@ApiTags('trends')
@ApiBearerAuth()
@Controller('trends')
export class CommitteeReportController {
  constructor(private readonly reports: CommitteeReportService) {}

  @Roles('quality', 'admin')
  @Get('monthly-report.pdf')
  async pdf(
    @CurrentUser() user: AuthUser,
    @Query(new ZodPipe(committeeReportQuerySchema)) q: CommitteeReportQuery,
    @Res() res: Response,
  ): Promise<void> {
    const { file, name } = await this.reports.download(user, q);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${name}"`);
    res.setHeader('Cache-Control', 'no-store');
    res.end(file);
  }
}
