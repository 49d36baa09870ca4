import { buildSummaryRow } from '@upstroke/capno';
import type { Knex } from 'knex';
import { etco2Ids, type GeneratedRecord } from './generate';

const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

function snakeRow(row: object): Record<string, unknown> {
  return Object.fromEntries(Object.entries(row).map(([k, v]) => [snake(k), v]));
}

function recordRow(g: GeneratedRecord, device: string) {
  const { plan, stored } = g;
  const signed = plan.status === 'signed';
  const signedAt = new Date(g.endAt.getTime() + 36 * 3600 * 1000);
  return {
    id: stored.id,
    site_id: plan.siteId,
    unit_id: plan.unitId,
    arrest_at: plan.arrestAt,
    location: plan.unitName,
    age_group: stored.ageGroup,
    // Signed records go in closed: the lock refuses their events once they are signed.
    status: signed ? 'closed' : plan.status,
    witnessed: stored.witnessed,
    monitored: stored.monitored,
    first_rhythm: stored.firstRhythm,
    outcome: stored.outcome,
    end_reason: plan.status === 'open' ? null : g.endReason,
    profile_id: plan.profile.id,
    created_by: plan.recorderId,
    device_id: device,
    created_at: plan.arrestAt,
    updated_at: signed ? signedAt : g.endAt,
    signed_at: signed ? signedAt : null,
    signed_by: signed ? plan.leadId : null,
  };
}

function clinicalRows(g: GeneratedRecord, device: string) {
  const rid = g.stored.id;
  const by = g.plan.recorderId;
  const events = g.stored.events.map((e) => ({
    id: e.id,
    resuscitation_id: rid,
    at: e.at,
    kind: e.kind,
    data: JSON.stringify(e.data),
    recorded_by: by,
    device_id: device,
  }));
  const ids = etco2Ids(g);
  const etco2 = g.stored.etco2.map((v, i) => ({
    id: ids[i],
    resuscitation_id: rid,
    at: v.at,
    value: v.value,
    unit: v.unit,
    value_mmhg: v.value,
    source: v.source,
    recorded_by: by,
    device_id: device,
  }));
  return { events, etco2 };
}

/**
 * Stores generated records the way signing leaves them: record, events and EtCO2 values,
 * then the signature, then the summary row written by the same builder the API uses
 * (`buildSummaryRow`). Records whose id is already stored are skipped, so a re-run adds
 * nothing. One transaction per call. Returns how many records were added.
 */
export async function writeRecords(
  knex: Knex,
  batch: GeneratedRecord[],
  device: string,
): Promise<number> {
  if (batch.length === 0) return 0;
  const existing = new Set(
    (
      await knex('resuscitations')
        .whereIn(
          'id',
          batch.map((g) => g.stored.id),
        )
        .select<{ id: string }[]>('id')
    ).map((r) => r.id),
  );
  const fresh = batch.filter((g) => !existing.has(g.stored.id));
  if (fresh.length === 0) return 0;
  const clinical = fresh.map((g) => clinicalRows(g, device));
  const signed = fresh.filter((g) => g.plan.status === 'signed');
  await knex.transaction(async (trx) => {
    await trx.batchInsert(
      'resuscitations',
      fresh.map((g) => recordRow(g, device)),
      500,
    );
    await trx.batchInsert(
      'resuscitation_events',
      clinical.flatMap((c) => c.events),
      2000,
    );
    await trx.batchInsert(
      'etco2_samples',
      clinical.flatMap((c) => c.etco2),
      2000,
    );
    if (signed.length === 0) return;
    await trx('resuscitations')
      .whereIn(
        'id',
        signed.map((g) => g.stored.id),
      )
      .update({ status: 'signed' });
    const summaries = signed.map((g) => {
      const row = buildSummaryRow(g.stored);
      return snakeRow({ ...row, findingCounts: JSON.stringify(row.findingCounts) });
    });
    await trx.batchInsert('record_summaries', summaries, 1000);
  });
  return fresh.length;
}
