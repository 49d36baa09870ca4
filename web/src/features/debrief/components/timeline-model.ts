import { eventsInForce } from '@upstroke/capno';
import {
  clockFromArrest,
  type Debrief,
  type DebriefEvent,
  eventLabel,
  eventMarkerCodes,
} from '@upstroke/contracts';

/** Timeline markers: the shared codes plus symbols that only the screen's fonts draw. */
export const markerCodes: Record<string, string> = {
  ...eventMarkerCodes,
  'compressions-start': '▶',
  'compressions-stop': '■',
  correction: '✎',
};

export function markerOf(e: DebriefEvent): string {
  if (e.kind === 'drug' && e.data.drug === 'epinephrine') return 'E';
  return markerCodes[e.kind] ?? '•';
}

export interface Marker {
  id: string;
  tSec: number;
  code: string;
  label: string;
  amendment: boolean;
}

export interface Band {
  startSec: number;
  endSec: number;
}

export interface Rise {
  tSec: number;
  confounded: boolean;
  label: string;
}

export interface TimelineModel {
  durationSec: number;
  lowMmHg: number;
  manual: { x: number; y: number }[];
  imported: { x: number; y: number }[];
  breaths: { x: number; y: number }[];
  wave: { x: number; y: number }[];
  markers: Marker[];
  compressions: Band[];
  low: Band[];
  rises: Rise[];
}

/** Events as finally recorded (capno's correction rule), on the debrief's clock. */
export function effectiveEvents(d: Pick<Debrief, 'events' | 'record'>): DebriefEvent[] {
  const t0 = Date.parse(d.record.arrestAt);
  return eventsInForce(d.events).map((e) => ({ ...e, tSec: (Date.parse(e.at) - t0) / 1000 }));
}

/** Everything the timeline draws, from the debrief (pure: tested without a canvas). */
export function timelineModel(d: Debrief): TimelineModel {
  const pt = (p: { tSec: number; mmHg: number }) => ({
    x: p.tSec,
    y: Math.round(p.mmHg * 10) / 10,
  });
  const live = effectiveEvents(d);
  // With an `end` event the code's length is known; later entries (amendment notes) are
  // still listed but do not stretch the axis.
  const ended = d.events.some((e) => e.kind === 'end' && !e.supersededBy);
  const last = ended ? 0 : Math.max(0, ...d.events.map((e) => e.tSec));
  return {
    durationSec: Math.max(60, d.measures.durationSec, last),
    lowMmHg: d.profile.thresholds.lowEtco2MmHg,
    manual: d.etco2Series.filter((p) => p.source === 'manual').map(pt),
    imported: d.etco2Series.filter((p) => p.source === 'import').map(pt),
    breaths: d.etco2Series.filter((p) => p.source === 'waveform' || p.source === 'stream').map(pt),
    wave: d.waveformTrace
      ? d.waveformTrace.tSec.map((x, i) => ({ x, y: d.waveformTrace?.mmHg[i] ?? 0 }))
      : [],
    markers: live
      .filter((e) => e.tSec <= Math.max(60, d.measures.durationSec, last))
      .map((e) => ({
        id: e.id,
        tSec: e.tSec,
        code: markerOf(e),
        label: `${clockFromArrest(e.tSec)} ${eventLabel(e.kind, e.data)}`,
        amendment: e.amendment,
      })),
    compressions: d.measures.compressionIntervals ?? [],
    low: d.findings.filter((f) => f.kind === 'etco2-low'),
    rises: d.findings
      .filter((f) => f.kind === 'etco2-rise')
      .map((f) => ({
        tSec: f.startSec,
        confounded: f.confounder !== null,
        label: f.confounder ? `Rise (after ${f.confounder.replace('-', ' ')})` : 'Rise',
      })),
  };
}

/** The view around a finding: its interval with a margin either side. */
export function viewAround(startSec: number, endSec: number, durationSec: number): Band {
  const margin = Math.max(30, (endSec - startSec) * 0.5);
  return {
    startSec: Math.max(0, Math.floor(startSec - margin)),
    endSec: Math.min(durationSec, Math.ceil(endSec + margin)),
  };
}
