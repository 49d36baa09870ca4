import { Injectable } from '@nestjs/common';
import {
  COMMITTEE_REPORT_MONTHS,
  type CommitteeReportData,
  type CommitteeReportQuery,
  defaultDisplayFormat,
  outcomeLabels,
  spcMeasureSchema,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { forbidden } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { ExportsService } from '../exports/exports.service';
import { CommitteeReportRepository } from './committee-report.repository';
import { ControlChartService } from './control-chart.service';
import { TrendsService } from './trends.service';
import { addMonths } from './trends.time';
import { UtsteinService } from './utstein.service';

/**
 * The monthly committee report: the same control charts, Utstein summary and scope as the
 * Trends routes give for the month and the review queue's status, rendered by the exports.
 */
@Injectable()
export class CommitteeReportService {
  constructor(
    private readonly trends: TrendsService,
    private readonly charts: ControlChartService,
    private readonly utstein: UtsteinService,
    private readonly repo: CommitteeReportRepository,
    private readonly audit: AuditService,
    private readonly exportsService: ExportsService,
  ) {}

  /** Downloaded by the committee (quality) or an admin of the sites; audited as an export. */
  async download(user: AuthUser, q: CommitteeReportQuery) {
    if (user.role !== 'quality' && user.role !== 'admin')
      throw forbidden('Only the quality committee and admins download the monthly report');
    const file = await this.pdf(user, q, new Date());
    const name = reportFileName(q.month);
    await this.audit.exported(user.id, 'pdf', { entity: 'committee-report' }, { query: q });
    return { file, name };
  }

  async pdf(user: AuthUser, q: CommitteeReportQuery, generatedAt: Date): Promise<Buffer> {
    return this.render(await this.gather(user, q), generatedAt);
  }

  render(data: CommitteeReportData, generatedAt: Date): Promise<Buffer> {
    return this.exportsService.committeeReportPdf(data, generatedAt);
  }

  async gather(user: AuthUser, q: CommitteeReportQuery): Promise<CommitteeReportData> {
    const { month, baselineFrom, baselineTo, ...filter } = q;
    const to = `${addMonths(month, 1)}-01`;
    const inMonth = { ...filter, from: `${month}-01`, to };
    const window = { ...filter, from: `${addMonths(month, 1 - COMMITTEE_REPORT_MONTHS)}-01`, to };
    const scoped = this.trends.scope(user, inMonth);
    const [charts, utstein, reviews, sites, unitName] = await Promise.all([
      Promise.all(
        spcMeasureSchema.options.map((measure) =>
          this.charts.chart(user, { ...window, measure, baselineFrom, baselineTo }),
        ),
      ),
      this.utstein.summary(user, inMonth),
      this.repo.reviewCounts(scoped),
      this.repo.sites(scoped.siteIds),
      filter.unitId ? this.repo.unitName(filter.unitId) : Promise.resolve(null),
    ]);
    const words = [
      unitName ? `Unit: ${unitName}` : 'All units',
      filter.firstRhythm ? `first rhythm ${filter.firstRhythm}` : null,
      filter.outcome ? `outcome ${outcomeLabels[filter.outcome].toLowerCase()}` : null,
      `calendar month in UTC; charts show the ${COMMITTEE_REPORT_MONTHS} months to ${month}`,
    ];
    return {
      month,
      scope: sites.map((s) => s.name).join(', ') || 'No site',
      filters: words.filter(Boolean).join(' · '),
      display: sites[0]?.display ?? defaultDisplayFormat,
      paperSize: sites[0]?.paperSize ?? 'A4',
      charts,
      utstein,
      reviews,
    };
  }
}

export const reportFileName = (month: string) => `upstroke-committee-report-${month}.pdf`;
