import { buildSummaryRow, xmrChart } from '@upstroke/capno';
import { demoPlans, improvementStart } from '../../db/seeds/demo-records';
import { generateRecord } from '../../db/src/demo/generate';

const month = (d: Date) => d.toISOString().slice(0, 7);
const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

/**
 * The demo seeds one genuine improvement (invented data, checked here only so the demo shows
 * what it claims): Emergency CPR poor before the change, good after; other units untouched.
 */
describe('demo generator: the Emergency improvement', () => {
  it.each(['2026-12-02', '2027-01-15', '2027-07-31'])(
    'on %s the months after the change lie beyond the limits of a baseline set before it',
    (day) => {
      const today = new Date(`${day}T10:00:00Z`);
      const start = month(improvementStart(today));
      const plans = demoPlans(today);
      const signed = plans.filter((p) => p.status === 'signed').map(generateRecord);
      const ed = signed.filter((g) => g.plan.unitName === 'Emergency');
      const byMonth = new Map<string, number[]>();
      for (const g of ed) {
        const m = month(g.plan.arrestAt);
        const cf = buildSummaryRow(g.stored).compressionFraction;
        if (cf !== null) byMonth.set(m, [...(byMonth.get(m) ?? []), cf]);
      }
      const months = [...byMonth.keys()].sort();
      const values = months.map((m) => median(byMonth.get(m)!));
      const end = months.findIndex((m) => m >= start);
      expect(end).toBeGreaterThanOrEqual(3);
      const chart = xmrChart(values, { baseline: { start: 0, end } });
      const after = months.slice(end);
      expect(after.length).toBeGreaterThanOrEqual(2);
      expect(chart.signals.map((s) => months[s.at])).toEqual(after);
      for (const p of plans) {
        const expected = p.unitName !== 'Emergency' ? undefined : month(p.arrestAt) >= start;
        expect(p.quality === undefined ? undefined : p.quality === 'good').toBe(expected);
      }
    },
  );
});
