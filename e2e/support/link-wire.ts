import type { Page } from 'playwright-core';

/** What the browser received from a monitor link, read off the wire by content. */
export interface Wire {
  anchorMs: number | null;
  periodMs: number;
  /** End (ms, stream time) of the newest samples received. */
  endMs: number;
  frames: number;
  samples: number;
}

export function watchLink(page: Page): Wire {
  const wire: Wire = { anchorMs: null, periodMs: 20, endMs: 0, frames: 0, samples: 0 };
  page.on('websocket', (ws) => {
    if (!ws.url().includes('/api/link/simulator')) return;
    ws.on('framereceived', (f) => {
      const m = JSON.parse(String(f.payload)) as {
        type: string;
        startAt?: string;
        sampleRateHz?: number;
        t0?: string;
        values?: number[];
      };
      if (m.type === 'hello') {
        wire.anchorMs = Date.parse(m.startAt ?? '');
        wire.periodMs = 1000 / (m.sampleRateHz ?? 50);
      } else if (m.t0 && m.values) {
        wire.frames++;
        wire.samples += m.values.length;
        wire.endMs = Math.max(wire.endMs, Date.parse(m.t0) + m.values.length * wire.periodMs);
      }
    });
  });
  return wire;
}
