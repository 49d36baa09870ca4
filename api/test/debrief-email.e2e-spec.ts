import { SMTPServer } from 'smtp-server';
import { OutboxRetryWorker } from '../src/modules/mail/outbox-retry.worker';
import { signedRecord } from './debrief-fixtures';
import { freePort } from './free-port';
import { startTestApp, type TestApp } from './test-app';

let PORT = 0;

/** A real SMTP server on loopback; `refuse` makes it answer 451 (temporary failure). */
function smtpServer() {
  const received: { to: string[]; raw: string }[] = [];
  const state = { refuse: false };
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      const parts: Buffer[] = [];
      stream.on('data', (b: Buffer) => parts.push(b));
      stream.on('end', () => {
        if (state.refuse) {
          const err = new Error('Mailbox busy, try later') as Error & { responseCode: number };
          err.responseCode = 451;
          return callback(err);
        }
        received.push({
          to: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(parts)
            .toString('utf8')
            .replace(/=\r?\n/g, '') /* undo quoted-printable soft breaks */,
        });
        callback();
      });
    },
  });
  return { server, received, state };
}

describe('e-mailing the debrief', () => {
  let t: TestApp;
  const smtp = smtpServer();
  beforeAll(async () => {
    PORT = await freePort();
    await new Promise<void>((resolve) => smtp.server.listen(PORT, '127.0.0.1', resolve));
    t = await startTestApp({
      smtp: { host: '127.0.0.1', port: PORT, from: 'Upstroke <no-reply@kestrel.test>' },
    });
  });
  afterAll(async () => {
    await t.close();
    await new Promise<void>((resolve) => smtp.server.close(() => resolve()));
  });
  const lead = async () => ['Authorization', `Bearer ${await t.tokenFor('lead')}`] as const;

  it('reaches the SMTP server with the summary, the link and the PDF attached', async () => {
    const { url, rec } = await signedRecord(t);
    const res = await t
      .http()
      .post(`${url}/email`)
      .set(...(await lead()))
      .send({ recipients: ['team@kestrel.test', 'nurse@kestrel.test'], message: 'Thanks, all.' });
    expect(res.status).toBe(202);
    expect(res.body.status).toBe('sent');
    expect(smtp.received).toHaveLength(1);
    const mail = smtp.received[0];
    expect(mail.to).toEqual(['team@kestrel.test', 'nurse@kestrel.test']);
    expect(mail.raw).toMatch(/Content-Type: application\/pdf/i);
    // "%PDF-" in base64 is "JVBERi0" (the file signature of every PDF).
    expect(mail.raw).toContain('JVBERi0');
    expect(mail.raw).toContain(`/debrief/${rec.id}`);
    expect(mail.raw).toContain('Thanks, all.');
    const row = await t.db('mailOutbox').where({ resuscitationId: rec.id }).first();
    expect(row.status).toBe('sent');
  });

  it('keeps a message queued for retry when the server refuses it, then sends it', async () => {
    const { url, rec } = await signedRecord(t);
    smtp.state.refuse = true;
    const before = smtp.received.length;
    const res = await t
      .http()
      .post(`${url}/email`)
      .set(...(await lead()))
      .send({ recipients: ['team@kestrel.test'] });
    expect(res.status).toBe(202);
    expect(res.body.status).toBe('queued');
    let row = await t.db('mailOutbox').where({ resuscitationId: rec.id }).first();
    expect(row).toMatchObject({ status: 'queued', attempts: 1 });
    expect(row.lastError).toMatch(/451|busy/);
    expect(row.attachment.length).toBeGreaterThan(1000);
    const worker = t.app.get(OutboxRetryWorker);
    worker.useSmtp('127.0.0.1', PORT);
    // Still refused: stays queued with a later next attempt, never lost.
    expect(await worker.runOnce(new Date(Date.now() + 10 * 60_000))).toBe(0);
    row = await t.db('mailOutbox').where({ resuscitationId: rec.id }).first();
    expect(row).toMatchObject({ status: 'queued', attempts: 2 });
    smtp.state.refuse = false;
    expect(await worker.runOnce(new Date(Date.now() + 60 * 60_000))).toBe(1);
    row = await t.db('mailOutbox').where({ resuscitationId: rec.id }).first();
    expect(row).toMatchObject({ status: 'sent', attempts: 3 });
    expect(smtp.received.length).toBe(before + 1);
    expect(smtp.received.at(-1)?.raw).toContain('JVBERi0');
  });

  it('refuses bad recipients, other roles, and lists the outbox to admins only', async () => {
    const { url } = await signedRecord(t);
    const bad = await t
      .http()
      .post(`${url}/email`)
      .set(...(await lead()))
      .send({ recipients: ['not-an-address'] });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('recipients.0');
    const quality = await t
      .http()
      .post(`${url}/email`)
      .set('Authorization', `Bearer ${await t.tokenFor('quality')}`)
      .send({ recipients: ['a@kestrel.test'] });
    expect(quality.status).toBe(403);
    const list = await t
      .http()
      .get('/api/mail/outbox')
      .set('Authorization', `Bearer ${await t.tokenFor('admin')}`);
    expect(list.status).toBe(200);
    expect(list.body.total).toBeGreaterThanOrEqual(2);
    expect(list.body.items[0]).not.toHaveProperty('attachment');
    expect(
      (
        await t
          .http()
          .get('/api/mail/outbox')
          .set(...(await lead()))
      ).status,
    ).toBe(403);
  });
});
