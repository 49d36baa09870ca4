import {
  Inject,
  Injectable,
  Logger,
  type OnModuleDestroy,
  type OnModuleInit,
} from '@nestjs/common';
import type { Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../../config';
import { type OutboxRow, OutboxRepository } from './outbox.repository';
import { createSmtpTransport } from './smtp-transport';

/** Attempts before a message is marked failed (it stays in the table for admins). */
export const MAX_ATTEMPTS = 8;

/** Back-off after the n-th failed attempt: 1, 2, 4 … min, at most 1 h. */
export function retryDelayMs(attempts: number): number {
  return Math.min(60 * 60_000, 60_000 * 2 ** Math.max(0, attempts - 1));
}

/**
 * Re-sends queued mail whose first attempt failed, with back-off. Runs on an interval in
 * the API (every `MAIL_RETRY_INTERVAL_MS`, 30 s by default); off in tests, where
 * `runOnce()` is called directly. Rows are claimed with `for update skip locked`, so two
 * API processes never send the same message.
 */
@Injectable()
export class OutboxRetryWorker implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('OutboxRetry');
  private timer: NodeJS.Timeout | null = null;
  private running = false;
  private transport: Transporter;

  constructor(
    private readonly outbox: OutboxRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {
    this.transport = createSmtpTransport(config.smtp);
  }

  /** Tests point the worker at another SMTP server. */
  useSmtp(host: string, port: number): void {
    this.transport.close();
    this.transport = createSmtpTransport({ host, port });
  }

  onModuleInit(): void {
    const interval = this.config.mailRetryIntervalMs;
    if (!(interval > 0)) return;
    this.timer = setInterval(() => void this.runOnce(), interval);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.transport.close();
  }

  /** One pass over the due messages; returns how many were sent. */
  async runOnce(now = new Date()): Promise<number> {
    if (this.running) return 0;
    this.running = true;
    let sent = 0;
    try {
      for (const row of await this.outbox.claimDue(now, 20, 5 * 60_000)) {
        if (await this.attempt(row)) sent += 1;
      }
    } catch (error) {
      this.logger.error(error);
    } finally {
      this.running = false;
    }
    return sent;
  }

  private async attempt(row: OutboxRow): Promise<boolean> {
    try {
      await this.transport.sendMail({
        from: this.config.smtp.from,
        to: row.to,
        subject: row.subject,
        text: row.body,
        attachments: row.attachment
          ? [
              {
                filename: row.attachmentName ?? 'attachment',
                content: row.attachment,
                contentType: row.attachmentType ?? undefined,
              },
            ]
          : undefined,
      });
      await this.outbox.markSent(row.id);
      return true;
    } catch (error) {
      const attempts = row.attempts + 1;
      const next = attempts >= MAX_ATTEMPTS ? null : new Date(Date.now() + retryDelayMs(attempts));
      await this.outbox.markFailed(row.id, String(error), next);
      return false;
    }
  }
}
