import { toMmHg } from '@upstroke/capno';
import {
  entryTimeProblem,
  etco2SampleSchema,
  eventSchema,
  jsonProblem,
  replacementProblem,
  PLAUSIBLE,
  waveformChunkSchema,
} from '@upstroke/contracts';
import type { ResusEvent, WaveformChunk } from '@upstroke/contracts';
import type { z } from 'zod';
import type { Etco2Entry } from './entries.repository';

/** What checking an item needs besides the item: the record it goes to. */
export interface RowContext {
  recordId: string;
  arrestAt: Date;
}

/** A synced item, validated for its record, or why it was refused. */
export type RowResult<T> = { value: T } | { error: string };

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

export function eventRow(raw: unknown, c: RowContext): RowResult<ResusEvent> {
  const e = parse(eventSchema, { resuscitationId: c.recordId, ...(raw as object) });
  if (isError(e)) return e;
  if (e.resuscitationId !== c.recordId)
    return { error: 'resuscitationId: does not match the record in the address' };
  const late = timeError('at', e.at, c);
  if (late) return late;
  const unfit = replacementProblem(e);
  if (unfit) return { error: unfit };
  const { replacement } = e.data as { replacement?: { at: string } };
  const replaced = replacement && timeError('data.replacement.at', replacement.at, c);
  if (replaced) return replaced;
  return { value: e };
}

export function etco2Row(raw: unknown, c: RowContext): RowResult<Etco2Entry> {
  const s = parse(etco2SampleSchema, raw);
  if (isError(s)) return s;
  const valueMmhg = toMmHg(s.value, s.unit);
  if (valueMmhg > 150) return { error: 'value: above 150 mmHg' };
  const late = timeError('at', s.at, c);
  if (late) return late;
  return { value: { ...s, valueMmhg } };
}

export function waveformRow(raw: unknown, c: RowContext): RowResult<WaveformChunk> {
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
  return { value: w };
}
