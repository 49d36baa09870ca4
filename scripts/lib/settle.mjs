// Waits for the machine to go quiet before a benchmark: a build, a server warming its worker
// threads or PostgreSQL writing its checkpoint take the CPU for a few seconds, and a timing
// taken then measures them, not the code. Linux only (/proc/stat); elsewhere it returns at once.
import fs from 'node:fs';

/** Total and idle CPU time (jiffies) over all cores, or null without /proc/stat. */
function cpuTimes() {
  try {
    const line = fs.readFileSync('/proc/stat', 'utf8').split('\n')[0];
    const fields = line.trim().split(/\s+/).slice(1).map(Number);
    // user nice system idle iowait irq softirq steal …: idle is idle + iowait.
    return { total: fields.reduce((a, b) => a + b, 0), idle: fields[3] + (fields[4] ?? 0) };
  } catch {
    return null;
  }
}

/**
 * Resolves once the CPUs were at least `idleShare` idle over one `windowMs` window, or after
 * `maxMs`. Returns the idle share of the last window and the time waited.
 */
export async function settle({ idleShare = 0.85, windowMs = 1000, maxMs = 30_000 } = {}) {
  const start = Date.now();
  let idle = 1;
  for (;;) {
    const a = cpuTimes();
    if (!a) return { idleShare: null, waitedMs: 0 };
    await new Promise((r) => setTimeout(r, windowMs));
    const b = cpuTimes();
    idle = b.total > a.total ? (b.idle - a.idle) / (b.total - a.total) : 1;
    if (idle >= idleShare || Date.now() - start >= maxMs)
      return { idleShare: Math.round(idle * 100) / 100, waitedMs: Date.now() - start };
  }
}
