import { Injectable } from '@nestjs/common';
import { funnelLimits, funnelPlot } from '@upstroke/capno';
import {
  type FunnelQuery,
  type FunnelResponse,
  thresholdDefaults,
  type TrendsFilter,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { FUNNEL_SOURCE, proportionOf } from './spc.points';
import { type NamedGroup, SpcRepository } from './spc.repository';
import { TrendsService } from './trends.service';

const DEFAULT_CF_TARGET = thresholdDefaults.compressionFractionTarget;
const CURVE_STEPS = 60;
const NO_UNIT = 'No unit recorded';

/**
 * Funnel plot of a share against volume, one point per unit (or per site, organisation-wide),
 * every unit listed even with no records, around the pooled share of all of them.
 */
@Injectable()
export class FunnelService {
  constructor(
    private readonly trends: TrendsService,
    private readonly repo: SpcRepository,
  ) {}

  async funnel(user: AuthUser, q: FunnelQuery): Promise<FunnelResponse> {
    const { measure, by, ...filter } = q;
    const scoped = this.trends.scope(user, filter);
    const [rows, named] = await Promise.all([
      this.repo.groups(scoped, by, DEFAULT_CF_TARGET),
      by === 'unit' ? this.repo.units(scoped.siteIds) : this.repo.sites(scoped.siteIds),
    ]);
    const shown =
      by === 'unit' && filter.unitId ? named.filter((u) => u.id === filter.unitId) : named;
    const counts = new Map(rows.map((r) => [r.groupId, proportionOf(measure, r)]));
    const groups: (NamedGroup | null)[] = [...shown];
    if (counts.has(null)) groups.push(null);
    const units = groups.map((g) => counts.get(g?.id ?? null) ?? { x: 0, n: 0 });
    const sumN = units.reduce((s, u) => s + u.n, 0);
    const target = sumN > 0 ? units.reduce((s, u) => s + u.x, 0) / sumN : null;
    const plotted = funnelPlot(target ?? 0, units);
    const points = plotted.map((p, i) => {
      const g = groups[i]!;
      return {
        id: g?.id ?? null,
        name: g?.name ?? NO_UNIT,
        siteName: g?.siteName ?? '',
        x: p.x,
        n: p.n,
        p: p.p,
        zone: target === null ? ('no-data' as const) : p.zone,
        side: target === null ? null : p.side,
        limits: target === null ? null : p.limits,
        records: recordsOf(filter, by, g),
      };
    });
    const maxN = Math.max(0, ...units.map((u) => u.n));
    return {
      measure,
      by,
      target,
      total: sumN,
      points,
      curve: curve(target, maxN),
      source: FUNNEL_SOURCE,
    };
  }
}

/** The records behind a point: the caller's filters narrowed to its unit or site. */
function recordsOf(filter: TrendsFilter, by: 'unit' | 'site', g: NamedGroup | null) {
  if (!g) return null;
  return by === 'unit' ? { ...filter, unitId: g.id } : { ...filter, siteId: g.id };
}

/** Limit lines from n = 1 to the largest n, spaced evenly on a log scale. */
function curve(target: number | null, maxN: number) {
  if (target === null || maxN < 1) return [];
  const ns = new Set<number>();
  for (let i = 0; i <= CURVE_STEPS; i++)
    ns.add(Math.round(Math.exp((Math.log(maxN) * i) / CURVE_STEPS)));
  return [...ns].map((n) => funnelLimits(target, n));
}
