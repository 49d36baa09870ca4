import { Module } from '@nestjs/common';
import { TrendsController } from './trends.controller';
import { TrendsRepository } from './trends.repository';
import { TrendsService } from './trends.service';
import { UtsteinService } from './utstein.service';

@Module({
  controllers: [TrendsController],
  providers: [TrendsRepository, TrendsService, UtsteinService],
})
export class TrendsModule {}
