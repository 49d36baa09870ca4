import { Injectable } from '@nestjs/common';
import type { TrendsFilter, UtsteinLine, UtsteinSummary } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { AuditService } from '../audit/audit.service';
import { utsteinCsv } from './trends.csv';
import { TrendsRepository } from './trends.repository';
import { TrendsService } from './trends.service';

/**
 * Utstein-style lines (Nolan 2019 in-hospital template, elements from memory): each count
 * is a share of all treated arrests in the period, so unknowns show as their own line.
 */
const lineSpecs: [key: string, label: string][] = [
  ['witnessedYes', 'Witnessed'],
  ['witnessedNo', 'Not witnessed'],
  ['witnessedUnknown', 'Witnessed: not recorded'],
  ['monitoredYes', 'Monitored'],
  ['monitoredNo', 'Not monitored'],
  ['monitoredUnknown', 'Monitored: not recorded'],
  ['shockable', 'First rhythm shockable (VF / pVT)'],
  ['nonShockable', 'First rhythm non-shockable (PEA / asystole / other)'],
  ['rhythmUnknown', 'First rhythm not recorded'],
  ['etco2Documented', 'EtCO2 documented'],
  ['anyRosc', 'Any ROSC'],
  ['sustainedRosc', 'Sustained ROSC (≥ 20 min)'],
  ['outcomeRoscSustained', 'Outcome: ROSC sustained'],
  ['outcomeRoscNotSustained', 'Outcome: ROSC not sustained'],
  ['outcomeDied', 'Outcome: died'],
  ['outcomeTransferred', 'Outcome: transferred'],
  ['outcomeUnknown', 'Outcome: not recorded'],
];

const medianSpecs: [key: string, label: string][] = [
  ['timeToCpr', 'Time to first compressions (s)'],
  ['timeToShock', 'Time to first shock, shockable (s)'],
  ['timeToEpi', 'Time to first epinephrine, non-shockable (s)'],
  ['compressionFraction', 'Compression fraction'],
  ['medianEtco2', 'Median EtCO2 during CPR (mmHg)'],
];

/** Percent to one decimal; none when nothing was counted. */
const percent = (count: number, of: number) =>
  of === 0 ? null : Math.round((1000 * count) / of) / 10;

@Injectable()
export class UtsteinService {
  constructor(
    private readonly trends: TrendsService,
    private readonly repo: TrendsRepository,
    private readonly audit: AuditService,
  ) {}

  /** The summary as CSV; audited as an export. */
  async csv(user: AuthUser, f: TrendsFilter): Promise<string> {
    const summary = await this.summary(user, f);
    await this.audit.exported(user.id, 'csv', { entity: 'utstein' }, { filter: f });
    return utsteinCsv(summary);
  }

  async summary(user: AuthUser, f: TrendsFilter): Promise<UtsteinSummary> {
    const row = await this.repo.utstein(this.trends.scope(user, f));
    const c = (k: string) => Number(row[k] ?? 0);
    const total = c('total');
    const derived: Record<string, number> = {
      witnessedUnknown: total - c('witnessedYes') - c('witnessedNo'),
      monitoredUnknown: total - c('monitoredYes') - c('monitoredNo'),
      rhythmUnknown: total - c('shockable') - c('nonShockable'),
      outcomeUnknown:
        total -
        c('outcomeRoscSustained') -
        c('outcomeRoscNotSustained') -
        c('outcomeDied') -
        c('outcomeTransferred'),
    };
    const lines: UtsteinLine[] = [
      {
        key: 'total',
        label: 'Treated arrests',
        count: total,
        denominator: total,
        percent: percent(total, total),
      },
      ...lineSpecs.map(([key, label]) => {
        const count = derived[key] ?? c(key);
        return { key, label, count, denominator: total, percent: percent(count, total) };
      }),
    ];
    const medians = medianSpecs.map(([key, label]) => ({
      key,
      label,
      value: row[key] ?? null,
      n: c(`${key}N`),
    }));
    return { from: f.from ?? null, to: f.to ?? null, total, lines, medians };
  }
}
