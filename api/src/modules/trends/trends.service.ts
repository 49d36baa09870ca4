import { Injectable } from '@nestjs/common';
import type {
  TrendMeasure,
  TrendPoint,
  TrendsFilter,
  TrendsRecordsQuery,
  TrendsResponse,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { forbidden } from '../../common/errors';
import { AuditService } from '../audit/audit.service';
import { recordCsvHeader, recordCsvLine } from './trends.csv';
import type { ScopedFilter } from './trends.queries';
import { type MonthRow, TrendsRepository } from './trends.repository';
import { monthsBetween, toInstant } from './trends.time';

const EXPORT_PAGE = 2000;

/** Which month-row fields give each series its value and its n. */
const measures: Record<TrendMeasure, [keyof MonthRow, keyof MonthRow]> = {
  compressionFraction: ['cf', 'cfN'],
  etco2Documented: ['etco2Doc', 'n'],
  fractionGe10: ['ge10', 'ge10N'],
  timeToFirstShockSec: ['shock', 'shockN'],
  timeToFirstEpinephrineSec: ['epi', 'epiN'],
  preshockLongPerRecord: ['preshock', 'preshockN'],
  anyRosc: ['anyRosc', 'n'],
  sustainedRosc: ['sustainedRosc', 'n'],
};

/** Trends for the quality committee: scoped to the caller's sites, computed in SQL. */
@Injectable()
export class TrendsService {
  constructor(
    private readonly repo: TrendsRepository,
    private readonly audit: AuditService,
  ) {}

  /** The caller's sites, narrowed by the filter; a site they do not belong to is refused. */
  scope(user: AuthUser, f: TrendsFilter): ScopedFilter {
    if (f.siteId && !user.siteIds.includes(f.siteId)) throw forbidden('You cannot see this site');
    return {
      siteIds: f.siteId ? [f.siteId] : user.siteIds,
      unitId: f.unitId,
      from: f.from ? toInstant(f.from) : undefined,
      to: f.to ? toInstant(f.to) : undefined,
      firstRhythm: f.firstRhythm,
      outcome: f.outcome,
    };
  }

  async series(user: AuthUser, f: TrendsFilter): Promise<TrendsResponse> {
    const scoped = this.scope(user, f);
    const [rows, thresholds] = await Promise.all([
      this.repo.monthly(scoped),
      this.repo.latestThresholds(scoped.siteIds),
    ]);
    const byMonth = new Map(rows.map((r) => [r.month, r]));
    const months = monthsBetween(
      scoped.from ?? rows[0]?.month,
      scoped.to ?? rows.at(-1)?.month,
      Boolean(scoped.to),
    );
    const series = Object.fromEntries(
      (Object.keys(measures) as TrendMeasure[]).map((m) => {
        const [value, n] = measures[m];
        const points: TrendPoint[] = months.map((month) => {
          const row = byMonth.get(month);
          return {
            month,
            value: (row?.[value] as number | null) ?? null,
            n: Number(row?.[n] ?? 0),
          };
        });
        return [m, points];
      }),
    ) as TrendsResponse['series'];
    const cfTargets = new Set(thresholds.map((t) => t.compressionFractionTarget ?? null));
    return {
      months,
      series,
      targets: {
        // One line only when every site in view shares the target.
        compressionFraction: cfTargets.size === 1 ? [...cfTargets][0] : null,
        fractionGe10: null,
        timeToFirstShockSec: null,
        timeToFirstEpinephrineSec: null,
        preshockLongPerRecord: null,
      },
      total: rows.reduce((sum, r) => sum + r.n, 0),
    };
  }

  async records(user: AuthUser, q: TrendsRecordsQuery) {
    const { sort, order, limit, offset, ...filter } = q;
    const { items, total } = await this.repo.records(this.scope(user, filter), {
      sort,
      order,
      limit,
      offset,
    });
    return { items: items.map(toIsoDates), total };
  }

  /** The records table as CSV, oldest first, fetched and sent a page at a time; audited. */
  async exportCsv(user: AuthUser, f: TrendsFilter): Promise<AsyncIterable<string>> {
    const scoped = this.scope(user, f);
    await this.audit.exported(user.id, 'csv', { entity: 'records' }, { filter: f });
    const repo = this.repo;
    return (async function* () {
      yield recordCsvHeader();
      let after: { arrestAt: Date; id: string } | null = null;
      for (;;) {
        const page = await repo.exportPage(scoped, after, EXPORT_PAGE);
        if (page.length === 0) return;
        yield page.map(recordCsvLine).join('');
        const last = page[page.length - 1];
        after = { arrestAt: last.arrestAt as Date, id: last.resuscitationId as string };
        if (page.length < EXPORT_PAGE) return;
      }
    })();
  }
}

function toIsoDates(row: Record<string, unknown>): Record<string, unknown> {
  return { ...row, arrestAt: (row.arrestAt as Date).toISOString() };
}
