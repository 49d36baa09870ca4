import { Box } from '@mui/material';
import { type RefObject, useEffect, useRef } from 'react';
import type { DisplayRing } from '../lib/waveform-store';

const WINDOW_SEC = 8;
const TOP_MMHG = 60;

/**
 * The scrolling live capnogram: redrawn on every animation frame from the display ring
 * (no React render per frame). The frame rate actually achieved is written to
 * `data-fps` so tests and the curious can see it.
 */
export function CapnogramCanvas({ ring }: { ring: RefObject<DisplayRing | null> }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const el = canvas.current;
    const ctx = el?.getContext('2d');
    if (!el || !ctx) return;
    let frame = 0;
    let frames = 0;
    let since = performance.now();
    const draw = (now: number) => {
      frames++;
      if (now - since >= 1000) {
        el.dataset.fps = String(Math.round((frames * 1000) / (now - since)));
        frames = 0;
        since = now;
      }
      paint(ctx, el, ring.current);
      frame = requestAnimationFrame(draw);
    };
    frame = requestAnimationFrame(draw);
    return () => cancelAnimationFrame(frame);
  }, [ring]);
  return (
    <Box
      component="canvas"
      ref={canvas}
      width={720}
      height={160}
      role="img"
      aria-label="Live capnogram"
      sx={{ width: '100%', height: 160, bgcolor: 'grey.900', borderRadius: 1, display: 'block' }}
    />
  );
}

function paint(ctx: CanvasRenderingContext2D, el: HTMLCanvasElement, ring: DisplayRing | null) {
  const { width: w, height: h } = el;
  ctx.clearRect(0, 0, w, h);
  ctx.strokeStyle = 'rgba(255,255,255,0.15)';
  for (const mmHg of [10, 20, 40]) {
    const y = h - (mmHg / TOP_MMHG) * h;
    ctx.beginPath();
    ctx.moveTo(0, y);
    ctx.lineTo(w, y);
    ctx.stroke();
  }
  if (!ring || ring.written === 0) return;
  const n = Math.min(ring.written, Math.round(ring.sampleRateHz * WINDOW_SEC));
  const len = ring.data.length;
  ctx.strokeStyle = '#ffd54f';
  ctx.lineWidth = 2;
  ctx.beginPath();
  for (let k = 0; k < n; k++) {
    const v = ring.data[(ring.written - n + k) % len];
    const x = w - ((n - k) / (ring.sampleRateHz * WINDOW_SEC)) * w;
    const y = h - (Math.min(v, TOP_MMHG) / TOP_MMHG) * h;
    if (k === 0) ctx.moveTo(x, y);
    else ctx.lineTo(x, y);
  }
  ctx.stroke();
}
