import { Injectable } from '@nestjs/common';
import { type ControlChart, pChart, xmrChart } from '@upstroke/capno';
import {
  type ControlChartQuery,
  type ControlChartResponse,
  isProportion,
  type SpcMeasure,
  thresholdDefaults,
} from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { baselineIndices, medianOf, monthRecords, proportionOf, SPC_RULES } from './spc.points';
import { type SpcMonthRow, SpcRepository } from './spc.repository';
import { TrendsService } from './trends.service';
import { monthsBetween } from './trends.time';

const DEFAULT_CF_TARGET = thresholdDefaults.compressionFractionTarget;

/**
 * Monthly control charts for the committee: p-charts for shares, XmR charts for the monthly
 * medians (statistics in @upstroke/capno spc), scoped like the trends series.
 */
@Injectable()
export class ControlChartService {
  constructor(
    private readonly trends: TrendsService,
    private readonly repo: SpcRepository,
  ) {}

  async chart(user: AuthUser, q: ControlChartQuery): Promise<ControlChartResponse> {
    const { measure, baselineFrom, baselineTo, ...filter } = q;
    const scoped = this.trends.scope(user, filter);
    const rows = await this.repo.monthly(scoped, DEFAULT_CF_TARGET, !isProportion(measure));
    const months = monthsBetween(
      scoped.from ?? rows[0]?.month,
      scoped.to ?? rows.at(-1)?.month,
      Boolean(scoped.to),
    );
    const byMonth = new Map(rows.map((r) => [r.month, r]));
    const target = measure === 'compressionFractionMet' ? targetOf(rows) : null;
    const empty = { measure, target, rules: SPC_RULES, signals: [], points: [] };
    if (months.length === 0 && !baselineFrom && !baselineTo) {
      return { ...empty, kind: isProportion(measure) ? 'p' : 'xmr', centre: null, baseline: null };
    }
    const baseline = baselineIndices(months, baselineFrom, baselineTo);
    const options = { baseline, periodName: 'months' };
    const counts = months.map((m) => monthFigures(measure, byMonth.get(m)));
    const chart = isProportion(measure)
      ? pChart(
          counts.map(({ x, n }) => ({ x: x ?? 0, n })),
          options,
        )
      : xmrChart(
          counts.map((c) => c.value),
          options,
        );
    return {
      ...empty,
      kind: chart.kind,
      centre: chart.centre,
      baseline: { from: months[baseline.start]!, to: months[baseline.end - 1]! },
      points: toPoints(chart, months, counts, (m) => monthRecords(filter, measure, m)),
      signals: chart.signals.map((s) => ({
        rule: s.rule,
        month: months[s.at]!,
        months: s.indices.map((i) => months[i]!),
        explanation: s.explanation,
      })),
    };
  }
}

interface MonthFigures {
  x: number | null;
  n: number;
  value: number | null;
}

function monthFigures(measure: SpcMeasure, row: SpcMonthRow | undefined): MonthFigures {
  if (!isProportion(measure)) return { x: null, ...medianOf(measure, row) };
  const { x, n } = proportionOf(measure, row);
  return { x, n, value: n > 0 ? x / n : null };
}

function toPoints(
  chart: ControlChart,
  months: string[],
  counts: MonthFigures[],
  records: (month: string) => ControlChartResponse['points'][number]['records'],
): ControlChartResponse['points'] {
  const flagged = new Set(chart.signals.flatMap((s) => s.indices));
  return chart.points.map((p, i) => ({
    month: months[i]!,
    value: p.value,
    n: counts[i]!.n,
    x: counts[i]!.x,
    lower: p.lower,
    upper: p.upper,
    signal: flagged.has(i),
    records: records(months[i]!),
  }));
}

/** One target when every site in view shares it; null when they differ. */
function targetOf(rows: SpcMonthRow[]): number | null {
  if (rows.length === 0) return DEFAULT_CF_TARGET;
  const lo = Math.min(...rows.map((r) => r.cfTargetMin));
  const hi = Math.max(...rows.map((r) => r.cfTargetMax));
  return lo === hi ? lo : null;
}
