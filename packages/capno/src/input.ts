import {
  analysisEventSchema,
  analysisInputSchema,
  thresholdsSchema,
  type AnalysisInput,
} from '@upstroke/contracts';
import { resolveThresholds } from './profile.js';

/** Stands in for a NaN or Infinity token so that the schema can name the field holding it. */
const NOT_A_NUMBER = '\u0000not-a-number';

export type InputResult = { ok: true; input: AnalysisInput } | { ok: false; message: string };

/** `['events', 3, 'at']` → `events[3].at`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) out += typeof p === 'number' ? `[${p}]` : `${out ? '.' : ''}${String(p)}`;
  return out || '(root)';
}

/** JSON.parse, accepting bare NaN/Infinity (outside strings) as a marker value. */
function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (err) {
    const marked = text.replace(/"(?:[^"\\]|\\.)*"|-?\b(?:NaN|Infinity)\b/g, (m) =>
      m.startsWith('"') ? m : JSON.stringify(NOT_A_NUMBER),
    );
    if (marked === text) throw err;
    return JSON.parse(marked);
  }
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v = root;
  for (const p of path)
    v = v !== null && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[p] : undefined;
  return v;
}

function checkOrder(list: readonly { at: string }[] | undefined, name: string): string | null {
  if (!list) return null;
  for (let i = 1; i < list.length; i++) {
    if (Date.parse(list[i].at) < Date.parse(list[i - 1].at))
      return `${name}[${i}].at: time goes backwards (earlier than ${name}[${i - 1}].at)`;
  }
  return null;
}

/** Cross-field rules the schema cannot express: time order, corrections, the merged profile. */
function checkSemantics(input: AnalysisInput): string | null {
  const order = checkOrder(input.events, 'events') ?? checkOrder(input.etco2, 'etco2');
  if (order) return order;
  const ids = new Set(input.events.map((e) => e.id));
  for (const [i, e] of input.events.entries()) {
    if (e.kind !== 'correction') continue;
    const data = e.data as {
      supersedes: string;
      replacement?: { kind: string; data: unknown; at: string };
    };
    if (!ids.has(data.supersedes)) return `events[${i}].data.supersedes: no event with this id`;
    if (!data.replacement) continue;
    const r = analysisEventSchema.safeParse({ id: e.id, ...data.replacement });
    if (!r.success) {
      const issue = r.error.issues[0];
      return `events[${i}].data.replacement${formatPath(issue.path) === '(root)' ? '' : '.' + formatPath(issue.path)}: ${issue.message}`;
    }
  }
  const t = thresholdsSchema.safeParse(resolveThresholds(input.profile));
  if (!t.success)
    return `profile.${formatPath(t.error.issues[0].path)}: ${t.error.issues[0].message}`;
  return null;
}

type Issue = NonNullable<
  ReturnType<typeof analysisInputSchema.safeParse>['error']
>['issues'][number];

/**
 * For a field that may take one of two shapes (the waveform: one run or a list of runs),
 * the issue of the shape the input has, so the message names the field at fault.
 */
function branchIssue(issue: Issue, raw: unknown): Issue {
  if (issue.code !== 'invalid_union' || issue.errors.length !== 2) return issue;
  const branch = Array.isArray(valueAt(raw, issue.path)) ? 1 : 0;
  const inner = issue.errors[branch][0];
  return inner ? { ...inner, path: [...issue.path, ...inner.path] } : issue;
}

/**
 * Parses and validates the text of an analysis input file. The message of a failure is
 * one line that starts with the field path (e.g. `events[3].at: …`).
 */
export function parseAnalysisInput(text: string): InputResult {
  let raw: unknown;
  try {
    raw = parseJson(text);
  } catch (err) {
    return { ok: false, message: `(root): invalid JSON: ${(err as Error).message}` };
  }
  const parsed = analysisInputSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = branchIssue(parsed.error.issues[0], raw);
    const notNumber = valueAt(raw, issue.path) === NOT_A_NUMBER;
    const msg = notNumber ? 'not a finite number (NaN or Infinity)' : issue.message;
    return { ok: false, message: `${formatPath(issue.path)}: ${msg}`.replace(/\s*\n\s*/g, ' ') };
  }
  const semantic = checkSemantics(parsed.data);
  return semantic ? { ok: false, message: semantic } : { ok: true, input: parsed.data };
}
