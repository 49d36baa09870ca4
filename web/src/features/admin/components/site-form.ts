import {
  createSiteSchema,
  defaultDisplayFormat,
  mailDomainsSchema,
  type Site,
} from '@upstroke/contracts';
import { z } from 'zod';

/** The site form: the domains are typed as one comma-separated line and sent as a list. */
export const siteFormSchema = createSiteSchema.omit({ units: true, mailDomains: true }).extend({
  mailDomains: z
    .string()
    .transform((s) => s.split(/[\s,;]+/).filter(Boolean))
    .pipe(mailDomainsSchema),
});
export type SiteFormInput = z.input<typeof siteFormSchema>;
export type SiteFormOutput = z.output<typeof siteFormSchema>;

export function siteFormDefaults(site: Site | null): SiteFormInput {
  if (!site)
    return {
      name: '',
      etco2Unit: 'mmHg',
      paperSize: 'A4',
      ...defaultDisplayFormat,
      mailDomains: '',
    };
  return {
    name: site.name,
    etco2Unit: site.etco2Unit,
    paperSize: site.paperSize,
    locale: site.locale,
    timeZone: site.timeZone,
    clock: site.clock,
    mailDomains: site.mailDomains.join(', '),
  };
}
