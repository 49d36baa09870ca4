import { Injectable } from '@nestjs/common';
import type { MailOverview, MailSinkMessage, MailSinkMessageDetail } from '@upstroke/contracts';
import { notFound } from '../../common/errors';
import { AdminMailRepository, type SinkRow } from './admin-mail.repository';
import { plainTextOf } from './mime-text';

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
  constructor(private readonly mail: AdminMailRepository) {}

  async overview(limit: number, offset: number): Promise<MailOverview> {
    const [sink, outbox] = await Promise.all([
      this.mail.listSink(limit, offset),
      this.mail.outboxCounts(),
    ]);
    return { sink: { items: sink.items.map(toMessage), total: sink.total }, outbox };
  }

  async message(id: number): Promise<MailSinkMessageDetail> {
    const row = await this.mail.findSink(id);
    if (!row) throw notFound('Message');
    return { ...toMessage(row), text: plainTextOf(row.raw) };
  }
}
