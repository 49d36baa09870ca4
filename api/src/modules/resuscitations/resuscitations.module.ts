import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { LiveFeed } from './live-feed';
import { LiveFeedGateway } from './live-feed.gateway';
import { ClinicalDataRepository } from './clinical-data.repository';
import { ClinicalRecordsService } from './clinical-records.service';
import { EntriesRepository } from './entries.repository';
import { ResuscitationAccess } from './resuscitation-access.service';
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
    EntriesRepository,
    ClinicalRecordsService,
    ResuscitationAccess,
    ResuscitationsService,
    SyncService,
    LiveFeed,
    LiveFeedGateway,
  ],
  exports: [ClinicalRecordsService, ResuscitationAccess],
})
export class ResuscitationsModule {}
