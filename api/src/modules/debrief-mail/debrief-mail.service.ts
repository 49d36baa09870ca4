import { Inject, Injectable } from '@nestjs/common';
import {
  clockFromArrest,
  type Debrief,
  etco2MeasureRows,
  findingKindLabels,
  formatDate,
  formatDateTime,
  formatPercent,
  outcomeLabels,
  type SendDebriefEmail,
  severityLabels,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { forbidden } from '../../common/errors';
import { APP_CONFIG, type AppConfig } from '../../config';
import { AuditService } from '../audit/audit.service';
import { DebriefService } from '../debrief/debrief.service';
import { ExportsService, fileName } from '../exports/exports.service';
import { MailService } from '../mail/mail.service';
import { SiteContextService } from '../site-context/site-context.service';

const pct = formatPercent;

/** Plain-text summary: no patient reference in the message itself (it is in the PDF). */
export function summaryText(d: Debrief, link: string, message?: string): string {
  const r = d.record;
  const m = d.measures;
  const lines = [
    message ? `${message}\n` : '',
    `Debrief of the resuscitation on ${formatDateTime(r.arrestAt, r.display)} (${r.display.timeZone})`,
    `${r.siteName}${r.unitName ? `, ${r.unitName}` : ''}${r.location ? `, ${r.location}` : ''}`,
    `Status: ${r.status === 'signed' ? 'signed' : 'not signed yet (draft)'}; outcome: ${r.outcome ? outcomeLabels[r.outcome] : 'not recorded'}`,
    '',
    `Duration ${clockFromArrest(m.durationSec)} · compression fraction ${pct(m.compressionFraction)} · longest pause ${m.longestPauseSec === null ? '—' : `${Math.round(m.longestPauseSec)} s`}`,
    etco2MeasureRows(m.etco2, r.etco2Unit)
      .map((row) => `${row.title} ${row.value}`)
      .join(' · '),
    `Findings: ${d.findings.length}`,
    ...d.findings
      .slice(0, 10)
      .map(
        (f) =>
          `- ${clockFromArrest(f.startSec)} ${findingKindLabels[f.kind]} (${severityLabels[f.severity]}): ${f.message}`,
      ),
    '',
    `Open the debrief: ${link}`,
    'The full record is attached as a PDF.',
    '',
    'Decision support only: follow your local resuscitation protocol and clinical judgement.',
  ];
  return lines.filter((l, i) => l !== '' || i > 0).join('\n');
}

/** The subject says plainly when the record is a draft, so nobody files it as the signed one. */
export function debriefSubject(d: Debrief): string {
  const r = d.record;
  const draft = r.status === 'signed' ? '' : 'Draft — not signed: ';
  return `${draft}Resuscitation debrief — ${r.siteName}, ${formatDate(r.arrestAt, r.display)}`;
}

/** E-mails the debrief (summary, link, PDF) through the outbox: never lost if SMTP is down. */
@Injectable()
export class DebriefMailService {
  constructor(
    private readonly debrief: DebriefService,
    private readonly exportsService: ExportsService,
    private readonly mail: MailService,
    private readonly audit: AuditService,
    private readonly sites: SiteContextService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async send(user: AuthUser, id: string, body: SendDebriefEmail) {
    if (user.role !== 'lead') throw forbidden('Only the lead e-mails the debrief');
    const d = await this.debrief.forUser(user, id);
    await this.sites.assertMailDomains(d.record.siteId, body.recipients);
    const pdf = await this.exportsService.pdfOf(d);
    const link = `${this.config.publicUrl}/debrief/${id}`;
    const status = await this.mail.send({
      to: body.recipients,
      subject: debriefSubject(d),
      text: summaryText(d, link, body.message),
      attachments: [{ filename: fileName(d, 'pdf'), content: pdf, contentType: 'application/pdf' }],
      resuscitationId: id,
      createdBy: user.id,
    });
    await this.audit.insert({
      userId: user.id,
      action: 'email',
      entity: 'resuscitation',
      entityId: id,
      resuscitationId: id,
      details: { recipients: body.recipients.length, to: body.recipients, status },
    });
    return { status };
  }
}
