import { thresholdDefaults, type ProfileInput, type Thresholds } from '@upstroke/contracts';

/** Merges a partial protocol profile over the guideline defaults (`thresholdDefaults`). */
export function resolveThresholds(profile?: ProfileInput): Thresholds {
  const out: Thresholds = { ...thresholdDefaults };
  if (!profile) return out;
  for (const key of Object.keys(out) as (keyof Thresholds)[]) {
    const v = profile[key];
    if (typeof v === 'number' && Number.isFinite(v)) out[key] = v;
  }
  return out;
}
