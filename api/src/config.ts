import crypto from 'node:crypto';
import os from 'node:os';

/** Runtime settings, all from the environment (see DEVELOPERS.md). */
export interface AppConfig {
  port: number;
  databaseUrl: string;
  jwtSecret: string;
  jwtExpiresInSec: number;
  /** Sign-in attempts per minute for one e-mail, from any address. */
  loginLimitPerMinute: number;
  /** Sign-in attempts per minute from one address, for any e-mails. */
  loginIpLimitPerMinute: number;
  /** Express `trust proxy`: false unless TRUST_PROXY names the proxies (e.g. `loopback`). */
  trustProxy: string | false;
  webDist: string | null;
  publicUrl: string;
  smtp: { host: string; port: number; from: string };
  smtpSinkPort: number | null;
  /** Largest number of PostgreSQL connections this process opens. */
  dbPoolMax: number;
  /** pino level for request logs; `silent` under tests. */
  logLevel: string;
  /** Worker threads for analysis and PDF rendering (one core stays free for requests). */
  workerThreads: number;
  /** How often the outbox worker retries queued mail; 0 = never (tests call it directly). */
  mailRetryIntervalMs: number;
  /**
   * When the monthly committee report goes out (cron, UTC), for the month before; null when
   * the schedule is off (`COMMITTEE_REPORT_SCHEDULE=off`, and under tests unless set).
   */
  committeeReportCron: string | null;
}

export const APP_CONFIG = Symbol('APP_CONFIG');

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const port = Number(env.PORT ?? 8080);
  const test = env.NODE_ENV === 'test';
  return {
    port,
    databaseUrl: env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/upstroke',
    // Without a configured secret every restart signs tokens anew: users sign in again.
    jwtSecret: env.JWT_SECRET ?? crypto.randomBytes(32).toString('hex'),
    jwtExpiresInSec: Number(env.JWT_EXPIRES_IN_SEC ?? 12 * 3600),
    loginLimitPerMinute: Number(env.LOGIN_LIMIT_PER_MINUTE ?? 5),
    loginIpLimitPerMinute: Number(env.LOGIN_IP_LIMIT_PER_MINUTE ?? 30),
    // X-Forwarded-For is believed only from proxies named here; by default from nobody.
    trustProxy: env.TRUST_PROXY ? env.TRUST_PROXY : false,
    webDist: env.WEB_DIST ?? null,
    publicUrl: env.PUBLIC_URL ?? `http://localhost:${port}`,
    smtp: {
      host: env.SMTP_HOST ?? '127.0.0.1',
      port: Number(env.SMTP_PORT ?? 2525),
      from: env.MAIL_FROM ?? 'Upstroke <no-reply@kestrel.test>',
    },
    smtpSinkPort: env.SMTP_SINK_PORT ? Number(env.SMTP_SINK_PORT) : null,
    dbPoolMax: Number(env.DB_POOL_MAX ?? 10),
    logLevel: test ? 'silent' : (env.LOG_LEVEL ?? 'info'),
    workerThreads: Number(
      env.WORKER_THREADS ?? Math.min(4, Math.max(1, os.availableParallelism() - 1)),
    ),
    mailRetryIntervalMs: test ? 0 : Number(env.MAIL_RETRY_INTERVAL_MS ?? 30_000),
    committeeReportCron:
      env.COMMITTEE_REPORT_SCHEDULE === 'off' || (test && !env.COMMITTEE_REPORT_CRON)
        ? null
        : (env.COMMITTEE_REPORT_CRON ?? '0 6 1 * *'),
  };
}
