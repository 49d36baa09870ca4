import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { LiveFeed } from './live-feed';
import { LiveFeedGateway } from './live-feed.gateway';
import { ClinicalDataRepository } from './clinical-data.repository';
import { ResuscitationAccess } from './resuscitation-access';
import { ResuscitationsController } from './resuscitations.controller';
import { ResuscitationsRepository } from './resuscitations.repository';
import { ResuscitationsService } from './resuscitations.service';
import { SyncService } from './sync.service';

@Module({
  imports: [AuthModule],
  controllers: [ResuscitationsController],
  providers: [
    ResuscitationsRepository,
    ClinicalDataRepository,
    ResuscitationAccess,
    ResuscitationsService,
    SyncService,
    LiveFeed,
    LiveFeedGateway,
  ],
  exports: [ResuscitationsRepository, ClinicalDataRepository, ResuscitationAccess],
})
export class ResuscitationsModule {}
