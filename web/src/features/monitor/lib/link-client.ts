import { type LinkHello, linkMessageSchema } from '@upstroke/contracts';
import { backoffDelay } from '../../../lib/offline/backoff';

/** Default silence before the link counts as lost (see `LinkClientOptions.silenceMs`). */
export const LINK_SILENCE_MS = 2000;

export type LinkStatus = 'idle' | 'connecting' | 'live' | 'lost';

export interface LinkHandlers {
  status(status: LinkStatus, detail?: string): void;
  hello(hello: LinkHello): void;
  /** New samples only: anything at or before what was already received is cut off. */
  samples(t0Ms: number, values: number[]): void;
  /** Frames missing between two received ones (by `seq`). */
  gap(missingFrames: number): void;
}

export interface LinkClientOptions {
  createSocket?: (url: string) => WebSocket;
  /**
   * No frame for this long counts as a lost link (a silent cable, a sleeping bridge).
   * Frames come about five times a second, so the default of 2 s says "lost" within 3 s of
   * the last sample.
   */
  silenceMs?: number;
  delay?: (failures: number) => number;
  /** Samples before this time (ms) are already held: a new client after a reconnect. */
  notBeforeMs?: number;
}

/**
 * One bedside link (CONTRACT.md "Monitor link"): connects, checks every frame, detects gaps
 * by `seq`, drops samples it already has (a reconnect may replay), and reconnects by itself
 * with back-off until `disconnect()`.
 */
export class MonitorLinkClient {
  private socket: WebSocket | null = null;
  private wanted = false;
  private failures = 0;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private watchdog: ReturnType<typeof setTimeout> | null = null;
  private hello: LinkHello | null = null;
  private nextSeq = 0;
  /** End (ms) of the last sample handed on, across reconnects. */
  private endMs: number;

  constructor(
    private readonly url: string,
    private readonly on: LinkHandlers,
    private readonly o: LinkClientOptions = {},
  ) {
    this.endMs = o.notBeforeMs ?? -Infinity;
  }

  connect(): void {
    this.wanted = true;
    this.open();
  }

  disconnect(): void {
    this.wanted = false;
    this.clearTimers();
    this.socket?.close(1000, 'closed by the user');
    this.socket = null;
    this.on.status('idle');
  }

  private open(): void {
    this.clearTimers();
    this.on.status('connecting');
    let ws: WebSocket;
    try {
      ws = (this.o.createSocket ?? ((u) => new WebSocket(u)))(this.url);
    } catch (e) {
      return this.lost(e instanceof Error ? e.message : 'cannot open the link');
    }
    this.socket = ws;
    this.hello = null;
    ws.onmessage = (m: MessageEvent) => this.message(m.data);
    ws.onclose = () => {
      if (this.socket === ws) this.lost('link closed');
    };
    ws.onerror = () => undefined; // a close follows every error
    this.armWatchdog();
  }

  private message(data: unknown): void {
    this.armWatchdog();
    let parsed;
    try {
      parsed = linkMessageSchema.safeParse(JSON.parse(String(data)));
    } catch {
      return;
    }
    if (!parsed.success) return; // an unknown frame is skipped, never fatal
    const m = parsed.data;
    if (m.type === 'hello') {
      this.hello = m;
      this.nextSeq = 0;
      this.failures = 0;
      this.on.hello(m);
      this.on.status('live');
      return;
    }
    if (!this.hello) return;
    if (m.seq > this.nextSeq) this.on.gap(m.seq - this.nextSeq);
    this.nextSeq = m.seq + 1;
    this.accept(Date.parse(m.t0), m.values, 1000 / this.hello.sampleRateHz);
  }

  private accept(t0Ms: number, values: number[], periodMs: number): void {
    const skip = Math.max(0, Math.round((this.endMs - t0Ms) / periodMs));
    if (skip >= values.length) return;
    const start = t0Ms + skip * periodMs;
    const fresh = skip > 0 ? values.slice(skip) : values;
    this.endMs = start + fresh.length * periodMs;
    this.on.samples(start, fresh);
  }

  private lost(detail: string): void {
    this.clearTimers();
    const ws = this.socket;
    this.socket = null;
    if (ws && ws.readyState <= 1) ws.close();
    if (!this.wanted) return;
    this.failures++;
    const delay = (this.o.delay ?? ((n) => backoffDelay(n, { baseMs: 500, maxMs: 10_000 })))(
      this.failures,
    );
    this.on.status('lost', detail);
    this.timer = setTimeout(() => this.open(), delay);
  }

  private armWatchdog(): void {
    if (this.watchdog) clearTimeout(this.watchdog);
    this.watchdog = setTimeout(
      () => this.lost('no data from the link'),
      this.o.silenceMs ?? LINK_SILENCE_MS,
    );
  }

  private clearTimers(): void {
    if (this.timer) clearTimeout(this.timer);
    if (this.watchdog) clearTimeout(this.watchdog);
    this.timer = this.watchdog = null;
  }
}
