import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { SchedulerRegistry } from '@nestjs/schedule';
import { simpleParser } from 'mailparser';
import type { SMTPServer } from 'smtp-server';
import { CLOCK, type Clock } from '../src/common/clock';
import { loadConfig } from '../src/config';
import { CommitteeReportMailService } from '../src/modules/committee-report/committee-report-mail.service';
import { COMMITTEE_REPORT_JOB } from '../src/modules/committee-report/committee-report.scheduler';
import { startMailSink } from '../src/modules/mail/mail-sink';
import { OutboxRepository } from '../src/modules/mail/outbox.repository';
import { freePort } from './free-port';
import { fixtureRows, insertFixture } from './quality-fixtures';
import { demoSiteId, startTestApp, type TestApp } from './test-app';

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'upstroke-schedule-'));
const otherSite = randomUUID();
const quietSite = randomUUID();
const otherQuality = { id: randomUUID(), email: 'quality@elsewhere.test' };

/** The fixture's records moved into February 2026 (the month the 1 March run reports). */
const february = fixtureRows().map((r, i) => ({
  ...r,
  arrestAt: `2026-02-${String(3 + 2 * i).padStart(2, '0')}T10:00:00Z`,
}));

interface Received {
  to: string[];
  subject: string;
  pdfText: string | null;
  attachment: { filename?: string; contentType: string } | null;
}

describe('monthly committee report on schedule', () => {
  let t: TestApp;
  let sink: SMTPServer;
  let clock: Clock;
  const at = (iso: string) => (clock.now = () => new Date(iso));

  async function received(): Promise<Received[]> {
    const rows = await t.db('mailSinkMessages').orderBy('id').select('raw');
    return Promise.all(
      rows.map(async ({ raw }: { raw: string }) => {
        const mail = await simpleParser(raw);
        const a = mail.attachments[0];
        let pdfText: string | null = null;
        if (a) {
          const file = path.join(tmp, `${randomUUID()}.pdf`);
          fs.writeFileSync(file, a.content);
          pdfText = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
        }
        const to = [mail.to ?? []].flat().flatMap((x) => x.value.map((v) => v.address ?? ''));
        const attachment = a ? { filename: a.filename, contentType: a.contentType } : null;
        return { to, subject: mail.subject ?? '', pdfText, attachment };
      }),
    );
  }

  beforeAll(async () => {
    const port = await freePort();
    t = await startTestApp({
      smtp: { host: '127.0.0.1', port, from: 'Upstroke <no-reply@kestrel.test>' },
      committeeReportCron: '0 6 1 * *',
    });
    sink = await startMailSink(t.db, port);
    clock = t.app.get<Clock>(CLOCK);
    await t.db('sites').insert([
      { id: otherSite, name: 'Elsewhere Hospital' },
      { id: quietSite, name: 'No Committee Clinic' },
    ]);
    await t.db('users').insert({ ...otherQuality, name: 'Q. Elsewhere', role: 'quality' });
    await t.db('userSites').insert({ userId: otherQuality.id, siteId: otherSite });
    await insertFixture(t.db, february);
  });
  afterAll(async () => {
    await t.close();
    await new Promise<void>((resolve) => sink.close(() => resolve()));
    fs.rmSync(tmp, { recursive: true, force: true });
  });

  it("fires at 06:00 UTC on the 1st and mails each site's quality users last month's PDF", async () => {
    const job = t.app.get(SchedulerRegistry).getCronJob(COMMITTEE_REPORT_JOB);
    at('2026-02-28T23:00:00Z');
    const next = job.cronTime.getNextDateFrom(clock.now()).toJSDate();
    expect(next.toISOString()).toBe('2026-03-01T06:00:00.000Z');
    expect(await received()).toHaveLength(0);

    at(next.toISOString());
    await job.fireOnTick();
    const mails = await received();
    expect(mails.map((m) => m.to).sort()).toEqual([
      ['quality@elsewhere.test'],
      ['quality@kestrel.test'],
    ]);
    const ours = mails.find((m) => m.to[0] === 'quality@kestrel.test')!;
    expect(ours.subject).toBe('Monthly committee report — Kestrel Bay Regional Hospital, 2026-02');
    expect(ours.attachment).toEqual({
      filename: 'upstroke-committee-report-2026-02.pdf',
      contentType: 'application/pdf',
    });
    const text = ours.pdfText!.replace(/\s+/g, ' ');
    expect(text).toContain('Monthly committee report — February 2026');
    expect(text).toContain(`Treated arrests ${february.length} 100.0 %`);
    const elsewhere = mails.find((m) => m.to[0] === otherQuality.email)!;
    expect(elsewhere.pdfText!.replace(/\s+/g, ' ')).toContain('Treated arrests 0');
    expect(await t.db('mailOutbox').where({ status: 'sent' })).toHaveLength(2);
  });

  it('sends nothing on a second run for the same month', async () => {
    const job = t.app.get(SchedulerRegistry).getCronJob(COMMITTEE_REPORT_JOB);
    at('2026-03-01T06:00:00Z');
    await job.fireOnTick();
    at('2026-03-15T12:00:00Z');
    await job.fireOnTick();
    expect(await received()).toHaveLength(2);
    const claims = await t.db('committeeReportSends').orderBy('siteId');
    expect(claims.map((c: { month: string }) => c.month)).toEqual(['2026-02', '2026-02']);
  });

  it('sends once per site when two instances run the same month at once', async () => {
    const service = t.app.get(CommitteeReportMailService);
    const now = new Date('2026-02-01T06:00:00Z');
    const [a, b] = await Promise.all([
      service.sendMonth('2026-01', now),
      service.sendMonth('2026-01', now),
    ]);
    expect([...a, ...b].sort()).toEqual([demoSiteId, otherSite].sort());
    const january = (await received()).filter((m) => m.subject.endsWith('2026-01'));
    expect(january).toHaveLength(2);
  });

  it('a send that fails between the claim and the queued message leaves the month unclaimed, so the next run sends it', async () => {
    const service = t.app.get(CommitteeReportMailService);
    const outbox = t.app.get(OutboxRepository);
    const now = new Date('2026-01-01T06:00:00Z');
    // The first site's message cannot be queued (as if the process died there).
    const insert = jest.spyOn(outbox, 'insert').mockRejectedValueOnce(new Error('connection lost'));
    try {
      const first = await service.sendMonth('2025-12', now);
      expect(first).toHaveLength(1);
      const claimed = await t
        .db('committeeReportSends')
        .where({ month: '2025-12' })
        .select<{ siteId: string }[]>('siteId');
      expect(claimed.map((c) => c.siteId)).toEqual(first);
      const second = await service.sendMonth('2025-12', now);
      expect([...first, ...second].sort()).toEqual([demoSiteId, otherSite].sort());
    } finally {
      insert.mockRestore();
    }
    const december = (await received()).filter((m) => m.subject.endsWith('2025-12'));
    expect(december.map((m) => m.to[0]).sort()).toEqual([
      otherQuality.email,
      'quality@kestrel.test',
    ]);
  });

  it('is on by default at 06:00 UTC on the 1st and off with COMMITTEE_REPORT_SCHEDULE=off', () => {
    expect(loadConfig({ NODE_ENV: 'production' }).committeeReportCron).toBe('0 6 1 * *');
    const off = loadConfig({ NODE_ENV: 'production', COMMITTEE_REPORT_SCHEDULE: 'off' });
    expect(off.committeeReportCron).toBeNull();
    expect(loadConfig({ NODE_ENV: 'test' }).committeeReportCron).toBeNull();
  });
});
