import { Module } from '@nestjs/common';
import { DebriefModule } from '../debrief/debrief.module';
import { ExportsController } from './exports.controller';
import { ExportsService } from './exports.service';

/** Chart exports of a record: PDF report and FHIR R4 Bundle. */
@Module({
  imports: [DebriefModule],
  controllers: [ExportsController],
  providers: [ExportsService],
  exports: [ExportsService],
})
export class ExportsModule {}
