import { Typography } from '@mui/material';
import {
  type DisplayFormat,
  formatDate,
  formatDateTime,
  labelOf,
  outcomeLabels,
  type TrendsFilter,
} from '@upstroke/contracts';
import { useDisplayFormat } from '../../../hooks/use-display-format';
import { useTrendSites } from '../api/get-sites';

const rhythms = { shockable: 'Shockable (VF / pVT)', 'non-shockable': 'Non-shockable' };
const dayMs = 86_400_000;

/** A filter bound as the reader means it: a day is a calendar day; the end day is the last one in. */
function bound(value: string, fmt: DisplayFormat, end: boolean): string {
  if (value.length > 10) return formatDateTime(value, fmt);
  const midnight = Date.parse(`${value}T00:00:00Z`) - (end ? dayMs : 0);
  return formatDate(new Date(midnight).toISOString(), { ...fmt, timeZone: 'UTC' });
}

export function periodText(f: TrendsFilter, fmt: DisplayFormat): string {
  if (!f.from && !f.to) return 'All dates';
  if (!f.to) return `From ${bound(f.from as string, fmt, false)}`;
  if (!f.from) return `Up to ${bound(f.to, fmt, true)}`;
  return `${bound(f.from, fmt, false)} to ${bound(f.to, fmt, true)}`;
}

/** The filters in words, above the charts and on the printout, so a page says what it shows. */
export function FiltersSummary({ filter }: { filter: TrendsFilter }) {
  const sites = useTrendSites().data?.sites ?? [];
  const { display } = useDisplayFormat(filter.siteId);
  const site = sites.find((s) => s.id === filter.siteId);
  const unit = sites.flatMap((s) => s.units).find((u) => u.id === filter.unitId);
  const parts = [
    `Site: ${site?.name ?? 'All my sites'}`,
    `Unit: ${unit?.name ?? 'All units'}`,
    `Period: ${periodText(filter, display)}`,
    `First rhythm: ${filter.firstRhythm ? rhythms[filter.firstRhythm] : 'Any'}`,
    `Outcome: ${filter.outcome ? labelOf(outcomeLabels, filter.outcome) : 'Any'}`,
  ];
  return (
    <Typography data-testid="trends-filters-summary" color="text.secondary" sx={{ mb: 2 }}>
      Showing signed records · {parts.join(' · ')}
    </Typography>
  );
}
