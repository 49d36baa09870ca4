import { Controller, Get, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Health } from '@upstroke/contracts';
import type { Response } from 'express';
import { Public } from '../../common/auth.decorators';
import { HealthRepository } from './health.repository';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly repo: HealthRepository) {}

  @Public()
  @Get()
  async health(@Res({ passthrough: true }) res: Response): Promise<Health> {
    if (await this.repo.databaseAnswers()) return { status: 'ok', db: 'ok' };
    res.status(503);
    return { status: 'degraded', db: 'down' };
  }
}
