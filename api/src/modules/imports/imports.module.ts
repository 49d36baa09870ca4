import { Module } from '@nestjs/common';
import { ResuscitationsModule } from '../resuscitations/resuscitations.module';
import { ImportsController } from './imports.controller';
import { ImportsRepository } from './imports.repository';
import { ImportsService } from './imports.service';

@Module({
  imports: [ResuscitationsModule],
  controllers: [ImportsController],
  providers: [ImportsRepository, ImportsService],
})
export class ImportsModule {}
