import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type TrendsFilter,
  trendsFilterSchema,
  type TrendsRecordsQuery,
  trendsRecordsQuerySchema,
} from '@upstroke/contracts';
import type { Response } from 'express';
import { Readable } from 'node:stream';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ZodPipe } from '../../common/zod.pipe';
import { TrendsService } from './trends.service';
import { UtsteinService } from './utstein.service';

const filterPipe = new ZodPipe(trendsFilterSchema);
const stamp = () => new Date().toISOString().slice(0, 10);

/** Trends, records table, Utstein summary and CSV exports for the quality committee. */
@ApiTags('trends')
@ApiBearerAuth()
@Roles('quality', 'admin', 'lead')
@Controller('trends')
export class TrendsController {
  constructor(
    private readonly trends: TrendsService,
    private readonly utstein: UtsteinService,
  ) {}

  @Get()
  series(@CurrentUser() user: AuthUser, @Query(filterPipe) f: TrendsFilter) {
    return this.trends.series(user, f);
  }

  @Get('records')
  records(
    @CurrentUser() user: AuthUser,
    @Query(new ZodPipe(trendsRecordsQuerySchema)) q: TrendsRecordsQuery,
  ) {
    return this.trends.records(user, q);
  }

  @Get('utstein')
  summary(@CurrentUser() user: AuthUser, @Query(filterPipe) f: TrendsFilter) {
    return this.utstein.summary(user, f);
  }

  @Get('export.csv')
  async exportCsv(
    @CurrentUser() user: AuthUser,
    @Query(filterPipe) f: TrendsFilter,
    @Res() res: Response,
  ): Promise<void> {
    const chunks = await this.trends.exportCsv(user, f);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="upstroke-records-${stamp()}.csv"`);
    Readable.from(chunks)
      .on('error', () => res.destroy())
      .pipe(res);
  }

  @Get('utstein.csv')
  async utsteinCsv(
    @CurrentUser() user: AuthUser,
    @Query(filterPipe) f: TrendsFilter,
    @Res() res: Response,
  ): Promise<void> {
    const csv = await this.utstein.csv(user, f);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="upstroke-utstein-${stamp()}.csv"`);
    res.send(csv);
  }
}
