import { Module } from '@nestjs/common';
import { TrendsModule } from '../trends/trends.module';
import { CommitteeReportMailService } from './committee-report-mail.service';
import { CommitteeReportSendsRepository } from './committee-report-sends.repository';
import { CommitteeReportScheduler } from './committee-report.scheduler';

/** The monthly committee report e-mailed to each site's quality users on schedule. */
@Module({
  imports: [TrendsModule],
  providers: [CommitteeReportSendsRepository, CommitteeReportMailService, CommitteeReportScheduler],
})
export class CommitteeReportModule {}
