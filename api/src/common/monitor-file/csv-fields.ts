import { type Co2Unit, co2UnitSchema, PLAUSIBLE } from '@upstroke/contracts';
import { mmHgFactor } from '@upstroke/capno';

/** Column positions found in the header row (CONTRACT.md "Monitor file import"). */
export interface Columns {
  time: number;
  co2: number;
  unit: number | null;
  event: number | null;
}

const ISO_WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,9})?)?(Z|[+-]\d{2}:?\d{2})$/;
const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** The lowest and highest CO2 accepted, in mmHg (a small negative is sensor zero drift). */
export const CO2_MIN_MMHG = -2;
export const CO2_MAX_MMHG = 150;

/** Reads the header row; a string is the problem to report on line 1. */
export function readHeader(fields: string[]): Columns | string {
  const names = fields.map((f) => f.trim().toLowerCase());
  const at = (n: string) => {
    const i = names.indexOf(n);
    return i < 0 ? null : i;
  };
  const time = at('time');
  const co2 = at('co2');
  if (time === null || co2 === null) {
    const shown = fields.slice(0, 6).join(', ').slice(0, 120);
    return `header: needs columns "time" and "co2" (found: ${shown || 'nothing'})`;
  }
  return { time, co2, unit: at('unit'), event: at('event') };
}

export function readUnit(text: string): Co2Unit | string {
  const parsed = co2UnitSchema.safeParse(text.trim());
  return parsed.success
    ? parsed.data
    : `unit: unknown unit "${text.trim().slice(0, 20)}" (use mmHg, kPa or %)`;
}

/** A time a record can carry (PLAUSIBLE.years), or the problem. */
function plausible(ms: number, s: string): number | string {
  const year = new Date(ms).getUTCFullYear();
  const { min, max } = PLAUSIBLE.years;
  if (Number.isFinite(ms) && year >= min && year <= max) return ms;
  return `time: "${s.slice(0, 40)}" is outside the years ${min} to ${max}`;
}

/** Epoch milliseconds of a `time` field; a string is the problem. */
export function readTime(text: string, startMs: number | null): number | string {
  const s = text.trim();
  if (ISO_WITH_OFFSET.test(s)) {
    const ms = Date.parse(s);
    if (Number.isFinite(ms)) return plausible(ms, s);
  }
  if (DECIMAL.test(s)) {
    if (startMs === null) return 'time: seconds need a "# start=<ISO time>" line before the header';
    return plausible(startMs + Number(s) * 1000, s);
  }
  return `time: "${s.slice(0, 40)}" is not an ISO-8601 time with offset nor seconds`;
}

/** The CO2 value as written (in the file's unit); a string is the problem. */
export function readCo2(text: string, unit: Co2Unit): number | string {
  const s = text.trim();
  if (!DECIMAL.test(s)) return `co2: "${s.slice(0, 40)}" is not a number`;
  const v = Number(s);
  const mmHg = v * mmHgFactor(unit);
  if (mmHg < CO2_MIN_MMHG || mmHg > CO2_MAX_MMHG)
    return `co2: ${s} ${unit} is outside the plausible range (${CO2_MIN_MMHG} to ${CO2_MAX_MMHG} mmHg)`;
  return v;
}

/** `# key=value` comment lines; returns null for other comments. */
export function readDirective(comment: string): { key: string; value: string } | null {
  const m = /^#\s*([a-z]+)\s*=\s*(.*)$/i.exec(comment.trim());
  return m ? { key: m[1].toLowerCase(), value: m[2].trim() } : null;
}

/** Rows whose event column marks a defibrillator shock (the alignment markers). */
export function isShockMarker(event: string | null): boolean {
  return event !== null && /^shock\b/i.test(event.trim());
}
