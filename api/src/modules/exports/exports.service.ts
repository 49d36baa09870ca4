import { Inject, Injectable } from '@nestjs/common';
import type { CommitteeReportData, Debrief } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { forbidden } from '../../common/errors';
import { APP_CONFIG, type AppConfig } from '../../config';
import { AuditService } from '../audit/audit.service';
import { DebriefService } from '../debrief/debrief.service';
import { type ReportOptions, WorkPool } from '../work-pool/work-pool.service';
import { type FhirBundle, toFhirBundle } from './fhir/fhir-bundle';
import { appVersion } from './version';

/**
 * Chart exports. Leads export (PRODUCT.md: PDF/FHIR export is the lead's); the quality
 * committee reads every record on its sites, so it may download them too. Recorders and
 * admins may not: exports leave the app with patient data.
 */
@Injectable()
export class ExportsService {
  constructor(
    private readonly debrief: DebriefService,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly pool: WorkPool,
  ) {}

  private mayExport(user: AuthUser): void {
    if (user.role !== 'lead' && user.role !== 'quality')
      throw forbidden('Only leads and the quality committee export records');
  }

  /** Composed and rendered in one worker task: only the file comes back to the event loop. */
  async pdf(user: AuthUser, id: string): Promise<{ file: Buffer; name: string }> {
    this.mayExport(user);
    const { file, record } = await this.debrief.report(user, id, this.reportOptions());
    const name = fileName({ record }, 'pdf');
    await this.audit.exported(user.id, 'pdf', { resuscitationId: id }, { file: name });
    return { file, name };
  }

  private reportOptions(): ReportOptions {
    return { version: appVersion(), generatedAt: new Date() };
  }

  /** Renders an already loaded debrief (also used to attach it to e-mail), in a worker. */
  async pdfOf(d: Debrief): Promise<Buffer> {
    const bytes = await this.pool.run('report', d, this.reportOptions());
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  /** Renders the monthly committee report (gathered by the trends module), in a worker. */
  async committeeReportPdf(data: CommitteeReportData, generatedAt: Date): Promise<Buffer> {
    const bytes = await this.pool.run('committeeReport', data, {
      version: appVersion(),
      generatedAt,
    });
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  async fhir(user: AuthUser, id: string): Promise<FhirBundle> {
    this.mayExport(user);
    const { debrief, waveform } = await this.debrief.withWaveform(user, id);
    const bundle = toFhirBundle(debrief, { publicUrl: this.config.publicUrl, waveform });
    await this.audit.exported(
      user.id,
      'fhir',
      { resuscitationId: id },
      { status: debrief.record.status },
    );
    return bundle;
  }
}

export function fileName(
  d: { record: Pick<Debrief['record'], 'arrestAt' | 'id'> },
  ext: string,
): string {
  const date = d.record.arrestAt.slice(0, 10);
  return `resuscitation-${date}-${d.record.id.slice(0, 8)}.${ext}`;
}
