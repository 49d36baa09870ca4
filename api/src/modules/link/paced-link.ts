import type { Co2Unit, LinkHello, LinkSamples } from '@upstroke/contracts';

/** What a link replays: a capnogram already in memory (simulated or read from a file). */
export interface LinkSource {
  sampleRateHz: number;
  unit: Co2Unit;
  values: ArrayLike<number>;
  /** Free text for the hello frame, e.g. `simulator:rosc`. */
  label: string;
}

export interface PacedOptions {
  /** Scenario seconds per wall-clock second (tests compress time). */
  speed: number;
  /** Index of the first sample to send. */
  fromIndex?: number;
  /** Samples per `samples` frame. */
  batchSize?: number;
  /** Wall clock (tests). */
  now?: () => number;
  /**
   * When the stream began (wall clock, ms): a reconnect to a monitor that kept running
   * resumes at the present. Default: now (each connection starts its own stream).
   */
  anchorMs?: number;
  /** Stream times (ms, as stamped in `t0`) whose frames never arrive: a simulated drop. */
  silence?: { fromMs: number; toMs: number };
}

/** The socket side a link needs: `ws` WebSocket satisfies it. */
export interface LinkSocket {
  readyState: number;
  bufferedAmount: number;
  send(data: string): void;
  close(code?: number, reason?: string): void;
}

const OPEN = 1;
const TICK_MS = 50;
// A slow client is not allowed to pile up frames in the server's memory.
const MAX_BUFFERED_BYTES = 4 * 1024 * 1024;

/**
 * Streams a source over one socket in the CONTRACT.md "Monitor link" format: a `hello`
 * frame, then `samples` frames paced to the wall clock. The first sample sent is stamped
 * with the time of connection; each frame's `t0` follows from its index and the rate, so
 * frames never overlap. Returns a stop function.
 */
export function startPacedLink(socket: LinkSocket, src: LinkSource, o: PacedOptions): () => void {
  const now = o.now ?? Date.now;
  const fs = src.sampleRateHz;
  const batch = o.batchSize ?? Math.max(1, Math.round(fs / 5));
  const first = o.fromIndex ?? 0;
  const startMs = o.anchorMs ?? now();
  const hello: LinkHello = {
    type: 'hello',
    sampleRateHz: fs,
    unit: src.unit,
    startAt: new Date(startMs).toISOString(),
    source: src.label,
  };
  socket.send(JSON.stringify(hello));
  const dueIndex = () =>
    Math.min(src.values.length, first + Math.floor(((now() - startMs) / 1000) * o.speed * fs));
  // A stream joined late starts at the present, on the stream's own frame boundaries.
  let next = first + Math.floor((dueIndex() - first) / batch) * batch;
  let seq = 0;
  const silent = (index: number) => {
    const t0 = startMs + ((index - first) * 1000) / fs;
    return o.silence !== undefined && t0 >= o.silence.fromMs && t0 < o.silence.toMs;
  };
  const tick = () => {
    if (socket.readyState !== OPEN) return stop();
    const due = dueIndex();
    while (next + batch <= due && socket.bufferedAmount < MAX_BUFFERED_BYTES) {
      // A lost frame still takes its number: a receiver sees the gap by `seq`.
      if (!silent(next)) socket.send(JSON.stringify(frame(src, startMs, first, next, batch, seq)));
      seq++;
      next += batch;
    }
    if (next + batch > src.values.length) {
      stop();
      socket.close(1000, 'end of recording');
    }
  };
  const timer = setInterval(tick, TICK_MS);
  function stop() {
    clearInterval(timer);
  }
  return stop;
}

function frame(
  src: LinkSource,
  startMs: number,
  first: number,
  index: number,
  batch: number,
  seq: number,
): LinkSamples {
  const values: number[] = new Array<number>(batch);
  for (let k = 0; k < batch; k++) values[k] = Math.round(src.values[index + k] * 100) / 100;
  const t0 = startMs + ((index - first) * 1000) / src.sampleRateHz;
  return { type: 'samples', seq, t0: new Date(t0).toISOString(), values };
}
