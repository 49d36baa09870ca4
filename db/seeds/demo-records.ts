import type { Knex } from 'knex';
import { thresholdDefaults } from '@upstroke/contracts';
import { generateRecord, type DemoStatus, type RecordPlan } from '../src/demo/generate';
import { Rand } from '../src/demo/random';
import { writeRecords } from '../src/demo/write';
import { demoProfileId, demoSiteId, demoUnits, demoUsers } from './demo-organisation';

export const DEMO_RECORD_COUNT = 40;
const DEMO_DEVICE = 'demo-generator';
const DAY_MS = 24 * 3600 * 1000;
const userId = (role: string) => demoUsers.find((u) => u.role === role)?.id as string;

/** Most codes happen in the Emergency department, then the ward, then ICU (invented mix). */
const unitWeights = [0.45, 0.2, 0.35];

function pickUnit(r: Rand) {
  let u = r.uniform();
  for (let i = 0; i < demoUnits.length; i++) {
    if (u < unitWeights[i]) return demoUnits[i];
    u -= unitWeights[i];
  }
  return demoUnits[0];
}

/**
 * The demo's one genuine improvement: until the first day of this many calendar months
 * before today the Emergency team's CPR goes poorly, from then on well every time (an
 * invented change of practice), so its control chart shows a shift against a baseline set
 * before it. The other units keep drawing their quality at random.
 */
export const IMPROVEMENT_MONTHS_AGO = 7;
const improvedUnit = demoUnits[0];

/** First instant (UTC) of the improvement, counted from `today`. */
export function improvementStart(today = new Date()): Date {
  return new Date(
    Date.UTC(today.getUTCFullYear(), today.getUTCMonth() - IMPROVEMENT_MONTHS_AGO, 1),
  );
}

/** The two latest codes are still open, the next four closed and unsigned, the rest signed. */
function statusOf(rankFromLatest: number): DemoStatus {
  if (rankFromLatest < 2) return 'open';
  return rankFromLatest < 6 ? 'closed' : 'signed';
}

/**
 * The demo's plans: ~40 codes at Kestrel Bay over the 12 months before today (UTC), each a
 * fixed draw of the seeded generator; one has sodium bicarbonate (a rise that is not ROSC).
 */
export function demoPlans(today = new Date()): RecordPlan[] {
  const anchor = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate());
  const r = new Rand(20261202);
  const changeAt = improvementStart(today).getTime();
  const times = Array.from({ length: DEMO_RECORD_COUNT }, (_, i) => {
    // The two open ones are from the last day; the rest spread over the year.
    const daysAgo = i < 2 ? 1 : 2 + r.uniform() * 362;
    return anchor - daysAgo * DAY_MS + r.int(0, 23 * 3600) * 1000;
  }).sort((a, b) => b - a);
  return times.map((t, rank) => {
    const unit = pickUnit(r);
    const quality = unit === improvedUnit ? (t >= changeAt ? 'good' : 'poor') : undefined;
    return {
      key: `demo:kestrel-bay:${rank}`,
      siteId: demoSiteId,
      unitId: unit.id,
      unitName: unit.name,
      arrestAt: new Date(t),
      status: statusOf(rank),
      profile: { id: demoProfileId, version: 1, thresholds: { ...thresholdDefaults } },
      recorderId: userId('recorder'),
      leadId: userId('lead'),
      bicarbonate: rank === 9,
      ...(quality ? { quality } : {}),
    };
  });
}

/** Generated demo resuscitations. Returns how many were added (none on a re-run). */
export async function seedDemoRecords(knex: Knex): Promise<number> {
  const existing = await knex('resuscitations')
    .where({ device_id: DEMO_DEVICE, site_id: demoSiteId })
    .count<{ n: string }[]>({ n: '*' });
  // The demo is seeded once: re-running must not add a second year of codes on a new day.
  if (Number(existing[0].n) >= DEMO_RECORD_COUNT) return 0;
  return writeRecords(knex, demoPlans().map(generateRecord), DEMO_DEVICE);
}
