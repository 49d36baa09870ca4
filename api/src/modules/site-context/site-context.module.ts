import { Module } from '@nestjs/common';
import { SiteContextController } from './site-context.controller';
import { SiteContextRepository } from './site-context.repository';
import { SiteContextService } from './site-context.service';

@Module({
  controllers: [SiteContextController],
  providers: [SiteContextRepository, SiteContextService],
  exports: [SiteContextService],
})
export class SiteContextModule {}
