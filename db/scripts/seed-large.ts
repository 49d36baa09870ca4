import knex, { type Knex } from 'knex';
import { thresholdDefaults } from '@upstroke/contracts';
import { knexConfig } from '../src/config';
import { generateRecord, type RecordPlan } from '../src/demo/generate';
import { Rand } from '../src/demo/random';
import { writeRecords } from '../src/demo/write';
import { stableId } from '../src/ids';
import {
  demoProfileId,
  demoSiteId,
  demoUnits,
  demoUsers,
  seedOrganisation,
} from '../seeds/demo-organisation';

/**
 * `npm run seed:large -- --records 10000`: signed records over five years across three
 * sites (Kestrel Bay plus two invented ones), through the demo generator and the API's
 * summary builder, in batches. Safe to run again: stored records are skipped.
 */
const BATCH = 250;
const DAY_MS = 24 * 3600 * 1000;

interface SiteSpec {
  id: string;
  profileId: string;
  thresholds: Record<string, number>;
  units: { id: string; name: string }[];
}

const extraSites = [
  {
    name: 'Harrow Point Community Hospital',
    units: ['Emergency', 'Coronary Care', 'Ward 2'],
    cf: 0.6,
  },
  { name: 'Fennick Vale General Hospital', units: ['Emergency', 'ICU', 'Ward 11'], cf: 0.8 },
];

/** The two invented extra sites, their units and profiles; staff other than leads see them. */
export async function ensureLargeSites(db: Knex): Promise<SiteSpec[]> {
  await seedOrganisation(db);
  const specs: SiteSpec[] = [
    {
      id: demoSiteId,
      profileId: demoProfileId,
      thresholds: { ...thresholdDefaults },
      units: demoUnits,
    },
  ];
  for (const s of extraSites) {
    const id = stableId(`site:${s.name}`);
    const profileId = stableId(`profile:${s.name}:1`);
    const thresholds = { ...thresholdDefaults, compressionFractionTarget: s.cf };
    const units = s.units.map((name) => ({ id: stableId(`unit:${s.name}:${name}`), name }));
    await db('sites').insert({ id, name: s.name }).onConflict('id').ignore();
    await db('units')
      .insert(units.map((u) => ({ ...u, site_id: id })))
      .onConflict('id')
      .ignore();
    await db('protocol_profiles')
      .insert({
        id: profileId,
        site_id: id,
        version: 1,
        name: 'Guideline defaults',
        thresholds: JSON.stringify(thresholds),
      })
      .onConflict('id')
      .ignore();
    const staff = demoUsers.filter((u) => u.role === 'quality' || u.role === 'admin');
    await db('user_sites')
      .insert(staff.map((u) => ({ user_id: u.id, site_id: id })))
      .onConflict(['user_id', 'site_id'])
      .ignore();
    specs.push({ id, profileId, thresholds, units });
  }
  return specs;
}

function largePlan(i: number, sites: SiteSpec[], anchor: number): RecordPlan {
  const r = new Rand(i * 7919 + 17);
  const site = sites[i % sites.length];
  const unit = r.pick(site.units);
  return {
    key: `large:${i}`,
    siteId: site.id,
    unitId: unit.id,
    unitName: unit.name,
    arrestAt: new Date(anchor - (1 + r.uniform() * (5 * 365 - 1)) * DAY_MS),
    status: 'signed',
    profile: { id: site.profileId, version: 1, thresholds: site.thresholds },
    recorderId: demoUsers[0].id,
    leadId: demoUsers[1].id,
    bicarbonate: r.chance(0.03),
  };
}

/** Generates and stores `count` records; returns how many were added. */
export async function seedLarge(db: Knex, count: number, log = console.log): Promise<number> {
  const sites = await ensureLargeSites(db);
  const today = new Date();
  const anchor = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate());
  let added = 0;
  for (let start = 0; start < count; start += BATCH) {
    const plans = Array.from({ length: Math.min(BATCH, count - start) }, (_, k) =>
      largePlan(start + k, sites, anchor),
    );
    added += await writeRecords(db, plans.map(generateRecord), 'large-generator');
    if ((start / BATCH) % 8 === 7) log(`  ${start + plans.length} / ${count}`);
  }
  return added;
}

function recordsArg(argv: string[]): number {
  const i = argv.indexOf('--records');
  const n = i >= 0 ? Number(argv[i + 1]) : 10000;
  if (!Number.isInteger(n) || n < 1 || n > 1_000_000) {
    throw new Error('--records: a whole number between 1 and 1,000,000');
  }
  return n;
}

async function main(): Promise<void> {
  const count = recordsArg(process.argv.slice(2));
  const db = knex(knexConfig());
  const t0 = Date.now();
  try {
    const added = await seedLarge(db, count);
    console.log(
      `seed:large: ${added} records added (${count} asked) in ${((Date.now() - t0) / 1000).toFixed(1)} s`,
    );
  } finally {
    await db.destroy();
  }
}

if (require.main === module) {
  main().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
