import fs from 'node:fs';
import path from 'node:path';
import { Inject, Injectable, type OnModuleDestroy } from '@nestjs/common';
import { Piscina } from 'piscina';
import { APP_CONFIG, type AppConfig } from '../../config';
import type { TaskMessage, TaskName, Tasks } from './work-pool.tasks';

export type { ReportOptions } from '../exports/pdf/report-pdf';
/** What every debrief task takes: the stored record, its header and the recorders' names. */
export type ComposeInput = Parameters<Tasks['compose']>;

/**
 * The worker file: compiled JavaScript in the built app; from sources (tests, tsx) a small
 * CommonJS entry that compiles the TypeScript on load, with the workspace packages read
 * from their sources too.
 */
function workerEntry(): { filename: string; execArgv: string[] } {
  const compiled = path.join(__dirname, 'work-pool.worker.js');
  if (fs.existsSync(compiled)) return { filename: compiled, execArgv: [] };
  return {
    filename: path.join(__dirname, 'work-pool.worker.dev.cjs'),
    execArgv: ['--conditions=upstroke-source'],
  };
}

/**
 * A pool of worker threads for CPU-heavy work (debrief analysis, PDF rendering), so the
 * event loop keeps answering (health checks, live feed, sync) while it runs. Threads start
 * on first use and end after a minute idle.
 */
@Injectable()
export class WorkPool implements OnModuleDestroy {
  private pool: Piscina | null = null;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  run<K extends TaskName>(
    name: K,
    ...args: Parameters<Tasks[K]>
  ): Promise<Awaited<ReturnType<Tasks[K]>>> {
    const message: TaskMessage<K> = { name, args };
    return this.piscina().run(message) as Promise<Awaited<ReturnType<Tasks[K]>>>;
  }

  private piscina(): Piscina {
    if (!this.pool) {
      const entry = workerEntry();
      this.pool = new Piscina({
        ...entry,
        minThreads: 0,
        maxThreads: this.config.workerThreads,
        idleTimeout: 60_000,
        // Below the request thread in the scheduler (Linux): health and sync answer first.
        niceIncrement: 10,
      });
    }
    return this.pool;
  }

  /** Tasks the worker threads have finished (0 until the pool first runs). */
  get completed(): number {
    return this.pool?.completed ?? 0;
  }

  async onModuleDestroy(): Promise<void> {
    const pool = this.pool;
    this.pool = null;
    await pool?.destroy();
  }
}
