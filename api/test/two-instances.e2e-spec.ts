import type { INestApplication } from '@nestjs/common';
import { SMTPServer } from 'smtp-server';
import request from 'supertest';
import { createApp } from '../src/app.factory';
import { APP_CONFIG, type AppConfig } from '../src/config';
import { OutboxRetryWorker } from '../src/modules/mail/outbox-retry.worker';
import { OutboxRepository } from '../src/modules/mail/outbox.repository';
import { aResuscitation, anEvent } from './factories';
import { freePort } from './free-port';
import { startTestApp, type TestApp } from './test-app';

/** A loopback SMTP server that keeps the subject of every message it accepts. */
function smtpServer() {
  const subjects: string[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      const parts: Buffer[] = [];
      stream.on('data', (b: Buffer) => parts.push(b));
      stream.on('end', () => {
        const subject = /^Subject: (.*)$/m.exec(Buffer.concat(parts).toString('utf8'));
        subjects.push(subject ? subject[1].trim() : '');
        callback();
      });
    },
  });
  return { server, subjects };
}

/**
 * Two API processes behind one address share nothing but PostgreSQL: each queued mail goes
 * out once, the sign-in throttle counts attempts made on either, and a tablet whose batches
 * land on one or the other (or on both, when a response was lost) stores every event once.
 */
describe('two API instances on one database', () => {
  let t: TestApp;
  let other: INestApplication;
  const smtp = smtpServer();
  let port = 0;
  beforeAll(async () => {
    port = await freePort();
    await new Promise<void>((resolve) => smtp.server.listen(port, '127.0.0.1', resolve));
    t = await startTestApp({
      loginLimitPerMinute: 3,
      smtp: { host: '127.0.0.1', port, from: 'Upstroke <no-reply@kestrel.test>' },
    });
    other = await createApp(t.app.get<AppConfig>(APP_CONFIG));
    await other.init();
  });
  afterAll(async () => {
    await other?.close();
    await t?.close();
    await new Promise<void>((resolve) => smtp.server.close(() => resolve()));
  });
  const apps = () => [t.app, other];

  it('sends each queued mail exactly once while both outbox workers run at the same time', async () => {
    const outbox = t.app.get(OutboxRepository);
    const due = new Date(Date.now() - 60_000);
    const subjects = Array.from({ length: 50 }, (_, i) => `Two instances ${i}`);
    for (const subject of subjects)
      await outbox.insert({ to: ['team@kestrel.test'], subject, body: 'x', nextAttemptAt: due });
    const workers = apps().map((app) => app.get(OutboxRetryWorker));
    workers.forEach((w) => w.useSmtp('127.0.0.1', port));
    // Each pass claims at most 20 rows; both workers pass together until nothing is due.
    let sent = 0;
    for (let round = 0; round < 6; round++) {
      const counts = await Promise.all(workers.map((w) => w.runOnce()));
      sent += counts[0] + counts[1];
    }
    expect(sent).toBe(50);
    expect([...smtp.subjects].sort()).toEqual([...subjects].sort());
    const rows = await t.db('mailOutbox').whereIn('subject', subjects).select('status', 'attempts');
    expect(rows).toHaveLength(50);
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);
  });

  it('holds the sign-in throttle across both instances', async () => {
    const attempt = (app: INestApplication) =>
      request(app.getHttpServer())
        .post('/api/auth/login')
        .send({ email: 'nobody@kestrel.test', password: 'not-the-password-1' })
        .then((r) => r.status);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push(await attempt(apps()[i % 2]));
    // Three attempts a minute per e-mail, wherever they land.
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });

  it('stores every event once when a tablet syncs alternately to both (and resends to both)', async () => {
    const token = `Bearer ${await t.tokenFor('recorder')}`;
    const rec = aResuscitation();
    const send = (app: INestApplication, events: object[]) =>
      request(app.getHttpServer())
        .post(`/api/resuscitations/${rec.id}/events/batch`)
        .set('Authorization', token)
        .set('X-Device-Id', 'tablet-a')
        .send({ events });
    await request(t.app.getHttpServer())
      .post('/api/resuscitations')
      .set('Authorization', token)
      .send(rec)
      .expect(201);
    const events = Array.from({ length: 60 }, (_, i) => anEvent('note', i, { text: `n${i}` }));
    let accepted = 0;
    let duplicates = 0;
    for (let b = 0; b < 6; b++) {
      const batch = events.slice(b * 10, b * 10 + 10);
      const first = await send(apps()[b % 2], batch);
      expect(first.status).toBe(201);
      accepted += first.body.accepted;
      // The response was lost: the tablet sends the batch again to both at once.
      const again = await Promise.all(apps().map((app) => send(app, batch)));
      for (const r of again) {
        expect(r.status).toBe(201);
        accepted += r.body.accepted;
        duplicates += r.body.duplicates;
      }
    }
    expect([accepted, duplicates]).toEqual([60, 120]);
    const stored = await t
      .db('resuscitationEvents')
      .where({ resuscitationId: rec.id })
      .orderBy('at')
      .select('id');
    expect(stored.map((e) => e.id)).toEqual(events.map((e) => e.id));
  });
});
