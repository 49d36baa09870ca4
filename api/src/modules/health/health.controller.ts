import { Controller, Get, Inject, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Health } from '@upstroke/contracts';
import type { Response } from 'express';
import { Public } from '../../common/auth.decorators';
import { KNEX, type Db } from '../../db/knex';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@Inject(KNEX) private readonly db: Db) {}

  @Public()
  @Get()
  async health(@Res({ passthrough: true }) res: Response): Promise<Health> {
    try {
      await this.db.raw('select 1').timeout(2000, { cancel: true });
      return { status: 'ok', db: 'ok' };
    } catch {
      res.status(503);
      return { status: 'degraded', db: 'down' };
    }
  }
}
