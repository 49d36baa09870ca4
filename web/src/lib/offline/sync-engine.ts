import { PLAUSIBLE, type RecordingContext } from '@upstroke/contracts';
import { authStore } from '../auth-store';
import { backoffDelay, type BackoffOptions } from './backoff';
import { measureClock } from './clock';
import { type OfflineDb } from './db';
import { drainOutbox, type DrainResult } from './outbox';
import { runStoreRead, type StoreRead, type Unsent } from './store-reads';
import { clockRefusal, ClockRefusedError } from './send-batch';
import type { SyncTransport } from './transport';
import { writeSignal } from './write-signal';

export interface EngineState {
  online: boolean;
  syncing: boolean;
  failures: number;
  lastError: string | null;
  lastSyncAt: number | null;
  clockOffsetMs: number | null;
  /** The server refused this tablet's clock (nothing sent): the recorder should check it. */
  clockRefused: string | null;
}

/** Consecutive failed drains after which a batch failing with 5xx is split. */
const BISECT_AFTER_FAILURES = 2;

/**
 * How long a clock measure (and the cached sites that come with it) serves before the next
 * drain measures again. A drain runs every second while taps come in; a tablet's clock does
 * not drift by seconds in a minute, and asking each time cost a request, a store write and
 * a redraw of every screen that reads the cached sites.
 */
export const CLOCK_MAX_AGE_MS = 60_000;

/** The cached context without its time stamp: what screens read from it. */
function sameContext(a: unknown, b: RecordingContext): boolean {
  if (!a || typeof a !== 'object') return false;
  const strip = ({ serverTime: _t, ...rest }: RecordingContext) => JSON.stringify(rest);
  return strip(a as RecordingContext) === strip(b);
}

/**
 * A tablet whose clock is further from the server's than the API accepts sends nothing: the
 * server would refuse its batches (400 on X-Clock-Offset-Ms) and its record starts too (an
 * arrest in the future), so the entries wait on the tablet until its time is fixed.
 */
function checkClock(offsetMs: number): void {
  if (Math.abs(offsetMs) > PLAUSIBLE.clockOffsetMs) throw clockRefusal(offsetMs);
}

export interface EngineOptions {
  intervalMs?: number;
  debounceMs?: number;
  backoff?: BackoffOptions;
  isOnline?: () => boolean;
  hasSession?: () => boolean;
  now?: () => number;
  /**
   * Runs the drain's reads (waiting count, unsent items); default: on this thread. The app
   * passes the tap writer's worker, so a drain's read never holds a tap's write back while
   * the screen draws (see `StoreRead`).
   */
  read?: <T>(r: StoreRead) => Promise<T>;
}

/**
 * Drains the outbox whenever it can: soon after a local write, on reconnect, when the tablet
 * wakes (visibility), and on an interval; after a failure it waits an exponential back-off
 * with jitter. One drain runs at a time; writes during a drain trigger another.
 */
export class SyncEngine {
  private state: EngineState;
  private readonly listeners = new Set<() => void>();
  private running: Promise<DrainResult | null> | null = null;
  private again = false;
  private nextAttemptAt = 0;
  private timers: ReturnType<typeof setTimeout>[] = [];
  private stopFns: (() => void)[] = [];
  private readonly o: Required<EngineOptions>;
  /** The last clock measure, reused by drains for `CLOCK_MAX_AGE_MS`. */
  private clock: { offsetMs: number; measuredAt: number } | null = null;

  constructor(
    private readonly db: OfflineDb,
    private readonly transport: SyncTransport,
    options: EngineOptions = {},
  ) {
    this.o = {
      intervalMs: 5000,
      // Long enough that a burst of taps goes in one drain, short enough to feel immediate.
      debounceMs: 1000,
      backoff: {},
      isOnline: () => typeof navigator === 'undefined' || navigator.onLine,
      hasSession: () => authStore.get() !== null,
      now: Date.now,
      read: <T>(r: StoreRead) => runStoreRead(db, r) as Promise<T>,
      ...options,
    };
    const online = this.o.isOnline();
    this.state = {
      online,
      syncing: false,
      failures: 0,
      lastError: null,
      lastSyncAt: null,
      clockOffsetMs: null,
      clockRefused: null,
    };
  }

  getState = (): EngineState => this.state;
  subscribe = (l: () => void) => {
    this.listeners.add(l);
    return () => {
      this.listeners.delete(l);
    };
  };

  private set(patch: Partial<EngineState>) {
    this.state = { ...this.state, ...patch };
    this.listeners.forEach((l) => l());
  }

  /** Runs a drain now unless one is running (then another follows) or a back-off holds. */
  syncNow(force = false): Promise<DrainResult | null> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    if (!this.o.isOnline() || !this.o.hasSession()) return Promise.resolve(null);
    if (!force && this.o.now() < this.nextAttemptAt) return Promise.resolve(null);
    this.running = this.run().finally(() => {
      this.running = null;
      if (this.again) {
        this.again = false;
        void this.syncNow();
      }
    });
    return this.running;
  }

  private async run(): Promise<DrainResult | null> {
    this.set({ syncing: true });
    try {
      const offsetMs = await this.clockOffset();
      checkClock(offsetMs);
      const result = (await this.o.read<number>({ read: 'waiting' }))
        ? await drainOutbox(
            this.db,
            this.transport,
            offsetMs,
            this.state.failures >= BISECT_AFTER_FAILURES,
            () => this.o.read<Unsent>({ read: 'unsent' }),
          )
        : { sent: 0, refused: 0 };
      this.nextAttemptAt = 0;
      this.set({
        syncing: false,
        failures: 0,
        lastError: null,
        lastSyncAt: this.o.now(),
        clockOffsetMs: offsetMs,
        clockRefused: null,
      });
      return result;
    } catch (error) {
      const failures = this.state.failures + 1;
      const delay = backoffDelay(failures, this.o.backoff);
      this.nextAttemptAt = this.o.now() + delay;
      this.later(delay, () => void this.syncNow());
      this.set({
        syncing: false,
        failures,
        lastError: error instanceof Error ? error.message : String(error),
        clockRefused: error instanceof ClockRefusedError ? error.message : null,
      });
      return null;
    }
  }

  /**
   * Tablet minus server clock, measured again when the last measure is older than
   * `CLOCK_MAX_AGE_MS` or a drain failed since; each measure refreshes the cached sites (for
   * offline starts), stored only when they changed so screens reading them do not redraw.
   */
  private async clockOffset(): Promise<number> {
    const now = this.o.now();
    const last = this.clock;
    if (last && this.state.failures === 0 && now - last.measuredAt < CLOCK_MAX_AGE_MS)
      return last.offsetMs;
    const { context, offsetMs } = await measureClock(() => this.transport.context(), this.o.now);
    this.clock = { offsetMs, measuredAt: now };
    const cached = await this.db.meta.get('context');
    await this.db.meta.bulkPut([
      ...(sameContext(cached?.value, context) ? [] : [{ key: 'context' as const, value: context }]),
      { key: 'clock', value: { offsetMs, at: context.serverTime } },
    ]);
    return offsetMs;
  }

  private later(ms: number, fn: () => void) {
    this.timers.push(setTimeout(fn, ms));
  }

  /** Wires the triggers (browser events, interval, local writes). Returns a stop function. */
  start(): () => void {
    const onOnline = () => {
      this.clock = null; // another network: measure again
      this.set({ online: true, failures: 0 });
      this.nextAttemptAt = 0;
      void this.syncNow(true);
    };
    const onOffline = () => this.set({ online: false });
    const onVisible = () => {
      if (document.visibilityState === 'visible') void this.syncNow();
    };
    let pending: ReturnType<typeof setTimeout> | null = null;
    const onWrite = () => {
      pending ??= setTimeout(() => {
        pending = null;
        void this.syncNow();
      }, this.o.debounceMs);
    };
    window.addEventListener('online', onOnline);
    window.addEventListener('offline', onOffline);
    document.addEventListener('visibilitychange', onVisible);
    const interval = setInterval(() => void this.syncNow(), this.o.intervalMs);
    const unsubscribe = writeSignal.subscribe(onWrite);
    this.stopFns.push(() => {
      window.removeEventListener('online', onOnline);
      window.removeEventListener('offline', onOffline);
      document.removeEventListener('visibilitychange', onVisible);
      clearInterval(interval);
      unsubscribe();
      if (pending) clearTimeout(pending);
    });
    void this.syncNow(true);
    return () => this.stop();
  }

  stop() {
    this.clock = null; // a restarted engine (another user signs in) measures again
    this.stopFns.forEach((f) => f());
    this.stopFns = [];
    this.timers.forEach(clearTimeout);
    this.timers = [];
  }
}
