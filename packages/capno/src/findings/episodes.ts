import type { Finding, FindingKind, Severity } from '@upstroke/contracts';

/** Kinds judged over a window or a run of values: one finding per continuous episode. */
export const EPISODE_KINDS: ReadonlySet<FindingKind> = new Set<FindingKind>([
  'etco2-low',
  'ventilation-fast',
  'waveform-absent',
  'rebreathing',
]);

const rank: Record<Severity, number> = { info: 0, warning: 1, critical: 2 };

/** The finding that speaks for a merged episode: the most severe, then the longest. */
function stronger(a: Finding, b: Finding): Finding {
  if (rank[a.severity] !== rank[b.severity]) return rank[a.severity] > rank[b.severity] ? a : b;
  return b.endSec - b.startSec > a.endSec - a.startSec ? b : a;
}

/**
 * Merges findings of an episode kind that overlap or touch into one spanning them all (its
 * message and severity from the strongest), so one continuous episode is never reported as
 * several overlapping findings. Other kinds pass unchanged. Order: by start, then kind.
 */
export function oneFindingPerEpisode(findings: readonly Finding[]): Finding[] {
  const sorted = [...findings].sort(
    (a, b) => a.startSec - b.startSec || a.kind.localeCompare(b.kind),
  );
  const open = new Map<FindingKind, Finding>();
  const out: Finding[] = [];
  for (const f of sorted) {
    const last = EPISODE_KINDS.has(f.kind) ? open.get(f.kind) : undefined;
    if (!last || f.startSec > last.endSec) {
      const copy = { ...f };
      out.push(copy);
      if (EPISODE_KINDS.has(f.kind)) open.set(f.kind, copy);
      continue;
    }
    const s = stronger(last, f);
    Object.assign(last, { ...s, startSec: last.startSec, endSec: Math.max(last.endSec, f.endSec) });
  }
  return out;
}
