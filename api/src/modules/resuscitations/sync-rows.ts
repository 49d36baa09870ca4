import { toMmHg } from '@upstroke/capno';
import {
  entryTimeProblem,
  etco2SampleSchema,
  eventSchema,
  jsonProblem,
  PLAUSIBLE,
  waveformChunkSchema,
} from '@upstroke/contracts';
import type { z } from 'zod';
import type { AuthUser } from '../../common/auth.decorators';

/** What an item's row needs besides the item: the record it goes to and who sent it. */
export interface RowContext {
  user: AuthUser;
  recordId: string;
  arrestAt: Date;
  deviceId?: string;
  clockOffsetMs?: number;
}

export type RowResult = { row: Record<string, unknown> } | { error: string };

function reasonOf(error: z.ZodError): string {
  const issue = error.issues[0];
  return issue ? `${issue.path.map(String).join('.') || 'item'}: ${issue.message}` : 'invalid';
}

/** Checks every item shares before its schema: storable JSON (no NUL, lone surrogate, depth). */
function parse<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> | { error: string } {
  const unsafe = jsonProblem(raw);
  if (unsafe) return { error: unsafe };
  const parsed = schema.safeParse(raw);
  return parsed.success ? (parsed.data as z.infer<S>) : { error: reasonOf(parsed.error) };
}

const isError = (v: unknown): v is { error: string } =>
  typeof v === 'object' && v !== null && 'error' in v;

function timeError(field: string, at: string, c: RowContext): { error: string } | null {
  const problem = entryTimeProblem(at, c.arrestAt);
  return problem ? { error: `${field}: ${problem}` } : null;
}

export function eventRow(raw: unknown, c: RowContext): RowResult {
  const e = parse(eventSchema, { resuscitationId: c.recordId, ...(raw as object) });
  if (isError(e)) return e;
  if (e.resuscitationId !== c.recordId)
    return { error: 'resuscitationId: does not match the record in the address' };
  const late = timeError('at', e.at, c);
  if (late) return late;
  const { replacement } = e.data as { replacement?: { at: string } };
  const replaced = replacement && timeError('data.replacement.at', replacement.at, c);
  if (replaced) return replaced;
  return {
    row: {
      id: e.id,
      resuscitationId: c.recordId,
      at: e.at,
      kind: e.kind,
      data: JSON.stringify(e.data),
      recordedBy: c.user.id,
      deviceId: e.deviceId ?? c.deviceId ?? null,
      clockOffsetMs: c.clockOffsetMs ?? null,
    },
  };
}

export function etco2Row(raw: unknown, c: RowContext): RowResult {
  const s = parse(etco2SampleSchema, raw);
  if (isError(s)) return s;
  const valueMmhg = toMmHg(s.value, s.unit);
  if (valueMmhg > 150) return { error: 'value: above 150 mmHg' };
  const late = timeError('at', s.at, c);
  if (late) return late;
  return {
    row: {
      ...s,
      resuscitationId: c.recordId,
      valueMmhg,
      recordedBy: c.user.id,
      deviceId: s.deviceId ?? c.deviceId ?? null,
    },
  };
}

export function waveformRow(raw: unknown, c: RowContext): RowResult {
  const w = parse(waveformChunkSchema, raw);
  if (isError(w)) return w;
  const { min, max } = PLAUSIBLE.waveformMmHg;
  const out = w.values.findIndex((v) => {
    const mmHg = toMmHg(v, w.unit);
    return !(mmHg >= min && mmHg <= max);
  });
  if (out >= 0) return { error: `values.${out}: outside ${min}..${max} mmHg` };
  const endAt = new Date(Date.parse(w.startAt) + (w.values.length / w.sampleRateHz) * 1000);
  const late = timeError('startAt', w.startAt, c) ?? timeError('end', endAt.toISOString(), c);
  if (late) return late;
  return {
    row: {
      id: w.id,
      resuscitationId: c.recordId,
      startAt: w.startAt,
      sampleRateHz: w.sampleRateHz,
      unit: w.unit,
      seq: w.seq ?? null,
      sampleCount: w.values.length,
      samples: Buffer.from(new Float32Array(w.values).buffer),
      source: 'stream',
    },
  };
}
