import { Inject, Injectable, type OnModuleDestroy } from '@nestjs/common';
import type { Transporter } from 'nodemailer';
import { DomainError } from '../../common/errors';
import { APP_CONFIG, type AppConfig } from '../../config';
import type { Db } from '../../db/knex';
import { OutboxRepository } from './outbox.repository';
import { createSmtpTransport } from './smtp-transport';

export interface MailMessage {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType?: string }[];
  resuscitationId?: string | null;
  createdBy?: string | null;
}

const unreachable = () =>
  new DomainError(
    503,
    'Service Unavailable',
    'The e-mail could not be sent (mail server unreachable); nothing was changed',
  );

/**
 * Sends mail over SMTP (`config.smtp`); in development and tests the local sink receives it.
 * Every message is first written to `mail_outbox` (the queue the admin mail viewer shows),
 * then sent at once.
 */
const recipients = (message: MailMessage): string[] =>
  Array.isArray(message.to) ? message.to : [message.to];

@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly transport: Transporter;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly outbox: OutboxRepository,
  ) {
    this.transport = createSmtpTransport(config.smtp);
  }

  /**
   * Inside a transaction (`trx`) the message shares the caller's fate: if it cannot be sent
   * the call throws 503 and the caller's rollback removes the queue row with everything
   * else. Without one, a failed attempt stays queued for retry and the call resolves 'queued'.
   */
  async send(message: MailMessage, trx?: Db): Promise<'sent' | 'queued'> {
    const id = await this.enqueue(message, trx);
    return this.attempt(id, message, trx);
  }

  /**
   * Queues a message without trying it: in the caller's transaction, the row commits with the
   * caller's other writes or not at all. `attempt` tries it; else the retry worker sends it.
   */
  enqueue(message: MailMessage, trx?: Db): Promise<string> {
    const attachment = message.attachments?.[0];
    return this.outbox.insert(
      {
        to: recipients(message),
        subject: message.subject,
        body: message.text,
        attachmentName: attachment?.filename ?? null,
        attachmentType: attachment?.contentType ?? null,
        attachment: attachment?.content ?? null,
        resuscitationId: message.resuscitationId ?? null,
        createdBy: message.createdBy ?? null,
        nextAttemptAt: new Date(Date.now() + 120_000),
      },
      trx,
    );
  }

  /** Tries a queued message now (see `send` for what a failure does). */
  async attempt(id: string, message: MailMessage, trx?: Db): Promise<'sent' | 'queued'> {
    try {
      const { resuscitationId: _r, createdBy: _c, ...mail } = message;
      await this.transport.sendMail({
        from: this.config.smtp.from,
        ...mail,
        to: recipients(message),
      });
    } catch (error) {
      if (trx) throw unreachable();
      await this.outbox.markFailed(id, String(error), new Date(Date.now() + 60_000));
      return 'queued';
    }
    await this.outbox.markSent(id, trx);
    return 'sent';
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
