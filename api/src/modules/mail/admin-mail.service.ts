import { Injectable } from '@nestjs/common';
import type { MailOverview, MailSinkMessage, MailSinkMessageDetail } from '@upstroke/contracts';
import type { AuthUser } from '../../common/auth.decorators';
import { notFound } from '../../common/errors';
import { AdminScopeService } from '../admin-scope/admin-scope.service';
import { MailSinkRepository, type SinkRow } from './mail-sink.repository';
import { OutboxRepository } from './outbox.repository';
import { parseMessage } from './parse-message';

function toMessage(row: SinkRow): MailSinkMessage {
  return {
    id: row.id,
    receivedAt: row.receivedAt.toISOString(),
    from: row.mailFrom,
    to: row.rcptTo,
    subject: row.subject,
    sizeBytes: row.sizeBytes,
  };
}

@Injectable()
export class AdminMailService {
  constructor(
    private readonly mail: MailSinkRepository,
    private readonly scope: AdminScopeService,
    private readonly outboxRows: OutboxRepository,
  ) {}

  /** The delivery queue as this admin may see it, newest first, without bodies. */
  async outbox(admin: AuthUser, limit: number, offset: number) {
    const { items, total } = await this.outboxRows.list(
      await this.scope.scopeOf(admin),
      limit,
      offset,
    );
    return {
      items: items.map((r) => ({
        ...r,
        nextAttemptAt: r.nextAttemptAt.toISOString(),
        sentAt: r.sentAt ? r.sentAt.toISOString() : null,
        createdAt: r.createdAt.toISOString(),
      })),
      total,
    };
  }

  async overview(admin: AuthUser, limit: number, offset: number): Promise<MailOverview> {
    const scope = await this.scope.scopeOf(admin);
    const [sink, outbox] = await Promise.all([
      this.mail.listSink(scope, limit, offset),
      this.mail.outboxCounts(scope),
    ]);
    return { sink: { items: sink.items.map(toMessage), total: sink.total }, outbox };
  }

  /** A message to someone this admin does not manage is not found, like a missing one. */
  async message(admin: AuthUser, id: number): Promise<MailSinkMessageDetail> {
    const row = await this.mail.findSink(await this.scope.scopeOf(admin), id);
    if (!row) throw notFound('Message');
    const parsed = await parseMessage(row.raw);
    const base = toMessage(row);
    return {
      ...base,
      // The message's own headers, decoded; the envelope where a header is missing.
      subject: parsed.subject ?? base.subject,
      from: parsed.from ?? base.from,
      to: parsed.to.length ? parsed.to : base.to,
      text: parsed.text,
      attachments: parsed.attachments,
    };
  }
}
