import { LiveAnalyzer, ventilationRate } from '@upstroke/capno';
import type { Etco2DisplayUnit, Finding, LinkHello } from '@upstroke/contracts';
import { useCallback, useEffect, useRef, useState } from 'react';
import { queueWaveformChunk } from '../../../lib/offline';
import { type LinkStatus, MonitorLinkClient } from '../lib/link-client';
import { ChunkAccumulator, DisplayRing } from '../lib/waveform-store';

export interface MonitorView {
  status: LinkStatus;
  detail: string | null;
  etco2MmHg: number | null;
  ratePerMin: number | null;
  gaps: number;
  samples: number;
  /** Seconds from the arrest of the newest sample. */
  dataSec: number;
  /** Seconds since the newest breath's value arrived (null before the first). */
  etco2AgeSec: number | null;
  /** The newest value once older than `STALE_AFTER_SEC`: shown as past, never as current. */
  staleEtco2MmHg: number | null;
  findings: Finding[];
}

const idle: MonitorView = {
  status: 'idle',
  detail: null,
  etco2MmHg: null,
  ratePerMin: null,
  gaps: 0,
  samples: 0,
  dataSec: 0,
  etco2AgeSec: null,
  staleEtco2MmHg: null,
  findings: [],
};

/** A value older than this is never shown as current (the link may be lost). */
export const STALE_AFTER_SEC = 10;
/** Findings the panel shows while they last (the waveform's own signs). */
const panelKinds = new Set(['etco2-rise', 'waveform-absent', 'rebreathing']);

interface Session {
  client: MonitorLinkClient;
  analyzer: LiveAnalyzer | null;
  hello: LinkHello | null;
  store: ChunkAccumulator;
  lastSec: number;
  /** Wall clock (ms) when the newest breath's value arrived. */
  breathAtMs: number | null;
}

/**
 * The monitor link behind the panel: samples go to the display ring (drawn by the canvas
 * each frame), to capno's LiveAnalyzer (breaths, rate, findings) and, in 5 s chunks, to the
 * offline store that syncs to the API. React state changes at most 4 times a second.
 */
export function useMonitorLink(o: {
  resuscitationId: string;
  arrestAt: string;
  /** The site's unit: the panel's finding messages write EtCO2 in it. */
  unit?: Etco2DisplayUnit;
  onEtco2?: (mmHg: number, at: string) => void;
}) {
  const [view, setView] = useState<MonitorView>(idle);
  const ring = useRef<DisplayRing | null>(null);
  const session = useRef<Session | null>(null);
  const latest = useRef(o);
  latest.current = o;
  const counters = useRef({ gaps: 0, samples: 0 });
  /** End of the newest sample kept, across connections: a replay is never stored twice. */
  const endMs = useRef(-Infinity);

  const publish = useCallback(() => {
    const s = session.current;
    const a = s?.analyzer;
    const breaths = a?.breaths ?? [];
    const last = breaths[breaths.length - 1];
    const value = last ? Math.round(last.etco2MmHg * 10) / 10 : null;
    const age = s?.breathAtMs != null ? (Date.now() - s.breathAtMs) / 1000 : null;
    const stale = age !== null && age > STALE_AFTER_SEC;
    setView((v) => ({
      ...v,
      etco2MmHg: stale ? null : value,
      staleEtco2MmHg: stale ? value : null,
      etco2AgeSec: age === null ? null : Math.floor(age),
      ratePerMin: breaths.length > 2 ? roundRate(ventilationRate(breaths.slice(-8), 30)) : null,
      gaps: counters.current.gaps,
      samples: counters.current.samples,
      dataSec: Math.round(s?.lastSec ?? 0),
      findings: a && s ? a.activeFindings(s.lastSec).filter((f) => panelKinds.has(f.kind)) : [],
    }));
  }, []);

  const connect = useCallback((url: string) => {
    session.current?.client.disconnect();
    const store = new ChunkAccumulator((c) => {
      void queueWaveformChunk({ ...c, resuscitationId: latest.current.resuscitationId });
    });
    const s: Session = {
      client: null as unknown as MonitorLinkClient,
      analyzer: null,
      hello: null,
      store,
      lastSec: 0,
      breathAtMs: null,
    };
    s.client = new MonitorLinkClient(
      url,
      {
        status: (status, detail) => {
          if (status !== 'live') store.flush();
          setView((v) => ({ ...v, status, detail: detail ?? null }));
        },
        hello: (h) => {
          const same =
            s.hello && s.hello.sampleRateHz === h.sampleRateHz && s.hello.unit === h.unit;
          if (!same) {
            s.analyzer = new LiveAnalyzer({
              arrestAt: latest.current.arrestAt,
              sampleRateHz: h.sampleRateHz,
              unit: h.unit,
              displayUnit: latest.current.unit,
            });
            ring.current = new DisplayRing(h.sampleRateHz);
          }
          s.hello = h;
        },
        samples: (t0Ms, values) => receive(s, t0Ms, values),
        gap: (n) => (counters.current.gaps += n),
      },
      { notBeforeMs: endMs.current },
    );
    session.current = s;
    s.client.connect();
  }, []);

  function receive(s: Session, t0Ms: number, values: number[]): void {
    const h = s.hello as LinkHello;
    const a = s.analyzer as LiveAnalyzer;
    const t0Sec = (t0Ms - Date.parse(latest.current.arrestAt)) / 1000;
    ring.current?.push(values);
    s.store.push(t0Ms, values, h.sampleRateHz, h.unit);
    counters.current.samples += values.length;
    s.lastSec = t0Sec + values.length / h.sampleRateHz;
    endMs.current = t0Ms + (values.length * 1000) / h.sampleRateHz;
    for (const b of a.pushSamples(t0Sec, values)) {
      s.breathAtMs = Date.now();
      const at = new Date(Date.parse(latest.current.arrestAt) + b.tSec * 1000).toISOString();
      latest.current.onEtco2?.(Math.round(b.etco2MmHg * 10) / 10, at);
    }
  }

  const disconnect = useCallback(() => {
    session.current?.store.flush();
    session.current?.client.disconnect();
  }, []);

  useEffect(() => {
    const timer = setInterval(publish, 250);
    return () => {
      clearInterval(timer);
      session.current?.store.flush();
      session.current?.client.disconnect();
    };
  }, [publish]);

  return { view, ring, connect, disconnect };
}

function roundRate(r: number | null): number | null {
  return r === null ? null : Math.round(r);
}
