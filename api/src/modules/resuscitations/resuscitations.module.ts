import { Module } from '@nestjs/common';
import { ClinicalDataRepository } from './clinical-data.repository';
import { ResuscitationAccess } from './resuscitation-access';
import { ResuscitationsController } from './resuscitations.controller';
import { ResuscitationsRepository } from './resuscitations.repository';
import { ResuscitationsService } from './resuscitations.service';
import { SyncService } from './sync.service';

@Module({
  controllers: [ResuscitationsController],
  providers: [
    ResuscitationsRepository,
    ClinicalDataRepository,
    ResuscitationAccess,
    ResuscitationsService,
    SyncService,
  ],
  exports: [ResuscitationsRepository, ClinicalDataRepository, ResuscitationAccess],
})
export class ResuscitationsModule {}
