import type { Site } from '@upstroke/contracts';

/** "Site A, Site B" for a list of site ids, using the sites this admin can see. */
export function siteNames(siteIds: string[], sites: Site[] | undefined): string {
  return siteIds
    .map((id) => sites?.find((s) => s.id === id)?.name)
    .filter(Boolean)
    .join(', ');
}
