import { Injectable, Logger } from '@nestjs/common';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditService } from '../audit/audit.service';
import { MailService } from '../mail/mail.service';
import { CommitteeReportService, reportFileName } from '../trends/committee-report.service';
import { CommitteeReportSendsRepository } from './committee-report-sends.repository';

/** The report is gathered as a quality user of the one site would see it. */
const committeeOf = (siteId: string): AuthUser => ({
  id: '00000000-0000-0000-0000-000000000000',
  email: '',
  name: 'Monthly report schedule',
  role: 'quality',
  siteIds: [siteId],
});

const bodyOf = (month: string, site: string) =>
  [
    `The monthly committee report of ${site} for ${month} is attached (PDF).`,
    '',
    'It holds the control charts of the 12 months to the month with their signals, the',
    "month's Utstein summary and the review queue. A signal asks for a look at the records",
    'behind it, not a conclusion: follow your local protocol and clinical judgement.',
  ].join('\n');

/**
 * Sends each site's monthly report to its quality users through the outbox, once per site
 * and month however many API instances run the schedule (a claim row in the database).
 */
@Injectable()
export class CommitteeReportMailService {
  private readonly logger = new Logger('CommitteeReport');

  constructor(
    private readonly reports: CommitteeReportService,
    private readonly repo: CommitteeReportSendsRepository,
    private readonly mail: MailService,
    private readonly audit: AuditService,
  ) {}

  /** Every site's report for the month; returns the sites it was sent for. */
  async sendMonth(month: string, now: Date): Promise<string[]> {
    const sent: string[] = [];
    for (const siteId of await this.repo.siteIds()) {
      try {
        if (await this.sendSite(siteId, month, now)) sent.push(siteId);
      } catch (error) {
        this.logger.error(`Monthly report ${month} for site ${siteId} failed: ${String(error)}`);
      }
    }
    return sent;
  }

  private async sendSite(siteId: string, month: string, now: Date): Promise<boolean> {
    const to = await this.repo.qualityUsers(siteId);
    if (to.length === 0 || (await this.repo.isSent(siteId, month))) return false;
    const committee = committeeOf(siteId);
    const data = await this.reports.gather(committee, { month, siteId });
    const pdf = await this.reports.render(data, now);
    const message = {
      to: to.map((u) => u.email),
      subject: `Monthly committee report — ${data.scope}, ${month}`,
      text: bodyOf(month, data.scope),
      attachments: [
        { filename: reportFileName(month), content: pdf, contentType: 'application/pdf' },
      ],
    };
    // Rendered first, claimed second: only the instance whose claim goes in sends. The claim
    // and the queued message commit together; the message is then tried at once (a failed try
    // stays queued for the retry worker).
    const id = await this.repo.claimAndQueue(siteId, month, (trx) =>
      this.mail.enqueue(message, trx),
    );
    if (id === null) return false;
    const status = await this.mail.attempt(id, message);
    await this.audit.insert({
      userId: null,
      action: 'email',
      entity: 'committee-report',
      details: { siteId, month, to: to.map((u) => u.email), status },
    });
    return true;
  }
}
