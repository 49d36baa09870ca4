/**
 * Plausibility bounds: what a real record can hold, not what a guideline recommends (site
 * profiles hold those). A value outside them is a typing slip, a broken tablet clock or a
 * hostile client, and is refused with its reason. The API and the forms read them here.
 */
const HOUR_MS = 3_600_000;

export const PLAUSIBLE = {
  /** An arrest is recorded within 10 years of its date, never more than 1 h ahead. */
  arrestPastMs: 10 * 365.25 * 24 * HOUR_MS,
  arrestFutureMs: HOUR_MS,
  /** Events, EtCO2 values and waveform lie within [arrest − 1 h, arrest + 24 h]. */
  entryBeforeArrestMs: HOUR_MS,
  entryAfterArrestMs: 24 * HOUR_MS,
  /** Extreme prematurity to the heaviest adults (common practice). */
  weightKg: { min: 0.3, max: 350 },
  /** Capnogram samples (baseline drift dips a little below zero; common practice). */
  waveformMmHg: { min: -5, max: 150 },
  /** PostgreSQL `integer` columns (seq, offsets in ms). */
  int32Max: 2 ** 31 - 1,
  /** Years a stored time may carry (PostgreSQL has no year 0; 9999 is a typing slip). */
  years: { min: 1900, max: 2199 },
  jsonDepth: 20,
  /** Tablet clock minus server clock (ms): beyond a day the tablet's time is wrong. */
  clockOffsetMs: 24 * HOUR_MS,
} as const;

/**
 * Largest plausible single dose per drug and unit: about ten times the usual adult dose
 * (epinephrine 1 mg, AHA 2020; amiodarone 300 mg, ERC 2021; lidocaine 1–1.5 mg/kg; sodium
 * bicarbonate 50 mmol, calcium chloride 10 % 10 mL, magnesium 2 g: common practice), so only
 * slips (grams for milligrams, a dose typed twice) are refused. mL assumes the usual
 * strengths (epinephrine 0.1 mg/mL, amiodarone 30 mg/mL, lidocaine 10 mg/mL, bicarbonate
 * 8.4 % 1 mmol/mL).
 */
export const DOSE_MAX: Record<string, Record<string, number>> = {
  epinephrine: { mg: 10, g: 0.01, mmol: 0.06, mL: 100 },
  amiodarone: { mg: 3000, g: 3, mmol: 5, mL: 100 },
  lidocaine: { mg: 1000, g: 1, mmol: 4, mL: 100 },
  'sodium-bicarbonate': { mg: 42_000, g: 42, mmol: 500, mL: 500 },
  calcium: { mg: 10_000, g: 10, mmol: 70, mL: 100 },
  magnesium: { mg: 20_000, g: 20, mmol: 80, mL: 100 },
  other: { mg: 100_000, g: 100, mmol: 1000, mL: 1000 },
};

export function doseProblem(drug: string, dose: number, unit?: string): string | null {
  const limits = DOSE_MAX[drug] ?? DOSE_MAX.other;
  const max = (unit && limits[unit]) || Math.max(...Object.values(limits));
  return dose > max ? `above the plausible ${drug} dose of ${max} ${unit ?? ''}`.trim() : null;
}

export function yearProblem(iso: string): string | null {
  const year = new Date(iso).getUTCFullYear();
  const { min, max } = PLAUSIBLE.years;
  return year >= min && year <= max ? null : `year must be between ${min} and ${max}`;
}

/** Why an arrest time cannot be right, or null. */
export function arrestTimeProblem(iso: string, now: number = Date.now()): string | null {
  const t = Date.parse(iso);
  if (t > now + PLAUSIBLE.arrestFutureMs) return 'more than 1 h in the future';
  if (t < now - PLAUSIBLE.arrestPastMs) return 'more than 10 years ago';
  return null;
}

/** Why an entry's time lies outside [arrest − 1 h, arrest + 24 h], or null. */
export function entryTimeProblem(iso: string, arrestAt: string | Date): string | null {
  const t = Date.parse(iso);
  const arrest = new Date(arrestAt).getTime();
  if (t < arrest - PLAUSIBLE.entryBeforeArrestMs) return 'more than 1 h before the arrest';
  if (t > arrest + PLAUSIBLE.entryAfterArrestMs) return 'more than 24 h after the arrest';
  return null;
}

// A high surrogate not followed by a low one, or a low one not preceded by a high one.
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export function textProblem(s: string): string | null {
  if (s.includes('\u0000')) return 'contains a NUL character';
  if (LONE_SURROGATE.test(s)) return 'contains an unpaired surrogate (not valid Unicode)';
  return null;
}

/**
 * Why a parsed JSON value cannot be stored (a bad string, a non-finite number, nesting deeper
 * than 20), with the path to it, or null. Keys are checked like strings.
 */
export function jsonProblem(value: unknown, path = '', depth = 0): string | null {
  const at = (p: string) => (path ? `${path}: ${p}` : p);
  if (typeof value === 'string') return textProblem(value) && at(textProblem(value) as string);
  if (typeof value === 'number') return Number.isFinite(value) ? null : at('not a finite number');
  if (value === null || typeof value !== 'object') return null;
  if (depth >= PLAUSIBLE.jsonDepth) return at(`nested deeper than ${PLAUSIBLE.jsonDepth}`);
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i += 1) {
      const issue = jsonProblem(value[i], path ? `${path}.${i}` : String(i), depth + 1);
      if (issue) return issue;
    }
    return null;
  }
  for (const [key, v] of Object.entries(value)) {
    const keyIssue = textProblem(key);
    const sub = path ? `${path}.${key}` : key;
    if (keyIssue) return `${path || '(body)'}: key ${keyIssue}`;
    const issue = jsonProblem(v, sub, depth + 1);
    if (issue) return issue;
  }
  return null;
}
