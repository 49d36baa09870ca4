import {
  type DebriefProfile,
  type ProfileInput,
  thresholdDefaults,
  thresholdsSchema,
} from '@upstroke/contracts';
import { resolveThresholds } from '../profile.js';
import type { StoredProfile } from './stored-record.js';

/** The stored thresholds as a partial profile: known keys holding finite numbers only. */
function storedInput(raw: unknown): ProfileInput {
  if (raw === null || typeof raw !== 'object') return {};
  const out: ProfileInput = {};
  for (const key of Object.keys(thresholdDefaults) as (keyof ProfileInput)[]) {
    const v: unknown = (raw as Record<string, unknown>)[key];
    if (typeof v === 'number' && Number.isFinite(v)) out[key] = v;
  }
  return out;
}

/**
 * The profile in force for a record: its stored values merged over the guideline defaults
 * and checked as a whole. The one fallback, everywhere: no profile, or a merged profile
 * that fails the checks, analyses with the guideline defaults (the version is still named,
 * so a reader can see which stored profile was set aside).
 */
export function profileInForce(p: StoredProfile | null | undefined): DebriefProfile {
  if (!p)
    return { id: null, version: null, name: 'Guideline defaults', thresholds: thresholdDefaults };
  const checked = thresholdsSchema.safeParse(resolveThresholds(storedInput(p.thresholds)));
  return {
    id: p.id ?? null,
    version: p.version,
    name: p.name ?? `Profile version ${p.version}`,
    thresholds: checked.success ? checked.data : thresholdDefaults,
  };
}
