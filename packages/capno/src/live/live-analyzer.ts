import type {
  AgeGroup,
  AnalysisEtco2,
  AnalysisEvent,
  AnalysisOutput,
  Breath,
  Co2Unit,
  Etco2DisplayUnit,
  Etco2Point,
  Finding,
  Interval,
  ProfileInput,
  Thresholds,
} from '@upstroke/contracts';
import { analyzeCore, recordEnd } from '../analyze.js';
import { BreathDetector } from '../breaths/breath-detector.js';
import { normalizeEvents, type InputEvent, type TimedEvent } from '../events/normalize.js';
import { resolveThresholds } from '../profile.js';
import { secondsFrom } from '../time.js';
import { mmHgFactor, toMmHg } from '../units.js';

export interface LiveOptions {
  arrestAt: string;
  sampleRateHz: number;
  unit: Co2Unit;
  barometricMmHg?: number;
  profile?: ProfileInput;
  /** Child and infant records use the profile's paediatric rules (default adult). */
  ageGroup?: AgeGroup;
  /** The site's unit: prompt and finding messages write EtCO2 in it (default mmHg). */
  displayUnit?: Etco2DisplayUnit;
}

/**
 * The engine behind the live screen. Samples go through the same streaming breath detector
 * as batch analysis (so breaths are identical); each sample is looked at once. Findings
 * are recomputed from the derived data only (events, EtCO2 values, breaths), never from
 * samples, so a refresh costs the same whatever the length of the waveform.
 */
export class LiveAnalyzer {
  private readonly arrestAt: string;
  private readonly scale: number;
  private readonly thresholds: Thresholds;
  private readonly ageGroup: AgeGroup | undefined;
  private readonly displayUnit: Etco2DisplayUnit | undefined;
  private readonly detector: BreathDetector;
  private started = false;
  private readonly coverage: Interval[] = [];
  private readonly rawEvents: InputEvent[] = [];
  private events: TimedEvent[] | null = [];
  private readonly points: Etco2Point[] = [];

  constructor(o: LiveOptions) {
    this.arrestAt = o.arrestAt;
    this.scale = mmHgFactor(o.unit, o.barometricMmHg);
    this.thresholds = resolveThresholds(o.profile);
    this.ageGroup = o.ageGroup;
    this.displayUnit = o.displayUnit;
    this.detector = new BreathDetector(o.sampleRateHz);
  }

  /**
   * Feeds a batch of samples (in the unit given at construction) starting at `t0Sec`
   * seconds from the arrest. A gap or overlap of more than half a sample restarts the
   * detector (the breath in progress is dropped). Returns the breaths completed.
   */
  pushSamples(t0Sec: number, values: ArrayLike<number>): Breath[] {
    const d = this.detector;
    const halfSample = 0.5 / d.sampleRateHz;
    if (!this.started || Math.abs(t0Sec - d.nextSampleSec) > halfSample) {
      d.restart(t0Sec);
      this.coverage.push({ startSec: t0Sec, endSec: t0Sec });
      this.started = true;
    }
    const fresh = d.push(values, this.scale);
    this.coverage[this.coverage.length - 1].endSec = d.nextSampleSec;
    for (const b of fresh)
      this.insertPoint({ tSec: b.tSec, mmHg: b.etco2MmHg, source: 'waveform' });
    return fresh;
  }

  pushEvent(e: AnalysisEvent | InputEvent): void {
    this.rawEvents.push(e);
    this.events = null; // corrections can change earlier events: re-normalise lazily
  }

  pushEtco2(v: AnalysisEtco2): void {
    const mmHg = toMmHg(v.value, v.unit, v.barometricMmHg);
    this.insertPoint({ tSec: secondsFrom(this.arrestAt, v.at), mmHg, source: v.source });
  }

  get breaths(): readonly Breath[] {
    return this.detector.breaths;
  }

  /** Findings still in progress at `nowSec` (their end is now). */
  activeFindings(nowSec: number): Finding[] {
    const active = this.compute(nowSec, true, nowSec - 1e-6).findings;
    return active.filter((f) => f.endSec >= nowSec - 1e-6);
  }

  /** The full analysis of what has arrived so far, up to `nowSec` (default: the last data). */
  snapshot(nowSec?: number): AnalysisOutput {
    return this.compute(nowSec, nowSec !== undefined);
  }

  private compute(nowSec: number | undefined, live: boolean, activeFrom?: number): AnalysisOutput {
    this.events ??= normalizeEvents(this.arrestAt, this.rawEvents);
    const endSec = nowSec ?? recordEnd(this.events, this.points, this.coverage);
    return analyzeCore({
      thresholds: this.thresholds,
      events: this.events,
      points: this.points,
      breaths: this.detector.breaths,
      waveformCoverage: this.coverage,
      endSec,
      live,
      activeFrom,
      ageGroup: this.ageGroup,
      displayUnit: this.displayUnit,
    });
  }

  /** Keeps points sorted by time; arrivals are almost always in order (O(1) then). */
  private insertPoint(p: Etco2Point): void {
    let i = this.points.length;
    while (i > 0 && this.points[i - 1].tSec > p.tSec) i--;
    this.points.splice(i, 0, p);
  }
}
