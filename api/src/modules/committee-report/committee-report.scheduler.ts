import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { SchedulerRegistry } from '@nestjs/schedule';
import { CronJob } from 'cron';
import { CLOCK, type Clock } from '../../common/clock';
import { APP_CONFIG, type AppConfig } from '../../config';
import { CommitteeReportMailService } from './committee-report-mail.service';

export const COMMITTEE_REPORT_JOB = 'committee-report';

/** The calendar month (UTC) before the one holding `now`: the month a report on the 1st covers. */
export function previousMonth(now: Date): string {
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - 1, 1))
    .toISOString()
    .slice(0, 7);
}

/**
 * Sends last month's committee report on the schedule `COMMITTEE_REPORT_CRON` (UTC; by
 * default 06:00 on the 1st). Off when the setting is null; the claim in the database, not
 * this process, makes the send happen once.
 */
@Injectable()
export class CommitteeReportScheduler implements OnModuleInit {
  private readonly logger = new Logger('CommitteeReport');

  constructor(
    private readonly mail: CommitteeReportMailService,
    private readonly registry: SchedulerRegistry,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  onModuleInit(): void {
    const cron = this.config.committeeReportCron;
    if (!cron) return;
    const job = CronJob.from({
      cronTime: cron,
      onTick: async () => {
        await this.run().catch((error: unknown) => this.logger.error(String(error)));
      },
      timeZone: 'UTC',
      // A run still going when the next tick comes is not started twice.
      waitForCompletion: true,
      start: true,
    });
    this.registry.addCronJob(COMMITTEE_REPORT_JOB, job);
  }

  /** One run: last month's report for every site not yet sent. */
  async run(): Promise<string[]> {
    const now = this.clock.now();
    const month = previousMonth(now);
    const sent = await this.mail.sendMonth(month, now);
    if (sent.length > 0) this.logger.log(`Monthly report ${month} sent for ${sent.length} site(s)`);
    return sent;
  }
}
