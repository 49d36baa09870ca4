import { Injectable } from '@nestjs/common';
import {
  mailDomainIssues,
  type RecordingContext,
  type SiteContext,
  thresholdDefaults,
  thresholdsSchema,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { badRequest } from '../../common/errors';
import { type ProfileRow, SiteContextRepository } from './site-context.repository';

/** Stored thresholds over the defaults, so a profile saved before a field existed still reads. */
function profileOf(row: ProfileRow | undefined): SiteContext['profile'] {
  if (!row) return null;
  const parsed = thresholdsSchema.safeParse({ ...thresholdDefaults, ...row.thresholds });
  return {
    id: row.id,
    version: row.version,
    thresholds: parsed.success ? parsed.data : thresholdDefaults,
  };
}

@Injectable()
export class SiteContextService {
  constructor(private readonly repo: SiteContextRepository) {}

  /**
   * Refuses every recipient outside the site's e-mail domains (subdomains included), naming
   * each address; a site with no domains set accepts any address.
   */
  async assertMailDomains(siteId: string, recipients: string[]): Promise<void> {
    const details = mailDomainIssues(recipients, await this.repo.mailDomains(siteId));
    if (details.length > 0) throw badRequest(details.map((d) => d.message).join('; '), details);
  }

  /** The user's own sites only: units, EtCO2 unit, and the current protocol thresholds. */
  async forUser(user: AuthUser): Promise<RecordingContext> {
    const [sites, units, profiles] = await Promise.all([
      this.repo.sitesByIds(user.siteIds),
      this.repo.unitsBySites(user.siteIds),
      this.repo.latestProfiles(user.siteIds),
    ]);
    return {
      serverTime: new Date().toISOString(),
      sites: sites.map((s) => ({
        id: s.id,
        name: s.name,
        etco2Unit: s.etco2Unit,
        display: { locale: s.locale, timeZone: s.timeZone, clock: s.clock },
        mailDomains: s.mailDomains,
        units: units.filter((u) => u.siteId === s.id).map((u) => ({ id: u.id, name: u.name })),
        profile: profileOf(profiles.find((p) => p.siteId === s.id)),
      })),
    };
  }
}
