import type { StoredRecord } from '@upstroke/capno';
import { stableId } from '../ids';
import { cprScript } from './cpr-script';
import { etco2Script } from './etco2-script';
import { Rand, seedOf } from './random';

export type DemoStatus = 'open' | 'closed' | 'signed';

/** Where and when one invented record happens, and who handled it. */
export interface RecordPlan {
  /** A unique name; every id and every draw of the record derives from it. */
  key: string;
  siteId: string;
  unitId: string;
  unitName: string;
  arrestAt: Date;
  status: DemoStatus;
  profile: { id: string; version: number; thresholds: Record<string, number> };
  recorderId: string;
  leadId: string;
  bicarbonate?: boolean;
  /** Fixes how well CPR goes (a unit's change of practice); drawn at random when absent. */
  quality?: 'good' | 'poor';
}

export interface GeneratedRecord {
  plan: RecordPlan;
  stored: StoredRecord;
  endAt: Date;
  endReason: string | null;
}

const at = (base: Date, sec: number) => new Date(base.getTime() + sec * 1000).toISOString();

/** One invented resuscitation: the record, its events and typed EtCO2 values. */
export function generateRecord(plan: RecordPlan): GeneratedRecord {
  const r = new Rand(seedOf(plan.key));
  const script = cprScript(r, { bicarbonate: plan.bicarbonate, quality: plan.quality });
  const values = etco2Script(r, script);
  // An open record is still being recorded: no end yet, and no outcome.
  const events =
    plan.status === 'open' ? script.events.filter((e) => e.kind !== 'end') : script.events;
  const end = events.find((e) => e.kind === 'end');
  const stored: StoredRecord = {
    id: stableId(`${plan.key}:record`),
    siteId: plan.siteId,
    unitId: plan.unitId,
    arrestAt: plan.arrestAt.toISOString(),
    ageGroup: 'adult',
    witnessed: plan.status === 'open' ? null : script.witnessed,
    monitored: plan.status === 'open' ? null : script.monitored,
    firstRhythm: plan.status === 'open' ? null : script.firstRhythm,
    outcome: plan.status === 'open' ? null : script.outcome,
    events: events.map((e, i) => ({
      id: stableId(`${plan.key}:event:${i}`),
      at: at(plan.arrestAt, e.tSec),
      kind: e.kind,
      data: e.data,
    })),
    etco2: values.map((v) => ({
      at: at(plan.arrestAt, v.tSec),
      value: v.mmHg,
      unit: 'mmHg' as const,
      source: 'manual',
    })),
    profile: { version: plan.profile.version, thresholds: plan.profile.thresholds },
  };
  return {
    plan,
    stored,
    endAt: new Date(plan.arrestAt.getTime() + script.endSec * 1000),
    endReason: end ? String((end.data as { reason: string }).reason) : null,
  };
}

/** Stable ids of a record's EtCO2 values (the stored record does not carry them). */
export function etco2Ids(g: GeneratedRecord): string[] {
  return g.stored.etco2.map((_, i) => stableId(`${g.plan.key}:etco2:${i}`));
}
