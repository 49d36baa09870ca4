import { WorkPool } from '../src/modules/work-pool/work-pool.service';
import { signedRecord } from './debrief-fixtures';
import { startTestApp, type TestApp } from './test-app';

function binary(
  res: { on: (e: string, cb: (c?: Buffer) => void) => void },
  cb: (e: Error | null, b: Buffer) => void,
) {
  const parts: Buffer[] = [];
  res.on('data', (c) => parts.push(c as Buffer));
  res.on('end', () => cb(null, Buffer.concat(parts)));
}

/**
 * Debrief analysis and PDF rendering run in worker threads (piscina), so requests are
 * answered while reports render. How fast is measured in `npm run bench` (pdf-health),
 * never here: this checks where the work runs and that nothing is lost on the way.
 */
describe('work off the event loop', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('renders 4 PDFs in the worker pool while health keeps answering', async () => {
    const { url } = await signedRecord(t, true);
    const pool = t.app.get(WorkPool);
    const before = pool.completed;
    const bearer = `Bearer ${await t.tokenFor('lead')}`;
    const pdf = () =>
      t.http().get(`${url}/report.pdf`).set('Authorization', bearer).buffer(true).parse(binary);
    const health: number[] = [];
    let rendering = true;
    const poll = (async () => {
      while (rendering) health.push((await t.http().get('/api/health')).status);
    })();
    const files = await Promise.all([pdf(), pdf(), pdf(), pdf()]);
    rendering = false;
    await poll;
    for (const f of files) {
      expect(f.status).toBe(200);
      expect((f.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    }
    // Each download: the debrief composed in a worker, then the report rendered in one.
    expect(pool.completed - before).toBe(8);
    expect(health.length).toBeGreaterThan(0);
    expect(health.every((s) => s === 200)).toBe(true);
  });

  it('composes the debrief of GET /debrief in a worker', async () => {
    const { url } = await signedRecord(t);
    const pool = t.app.get(WorkPool);
    const before = pool.completed;
    const res = await t
      .http()
      .get(`${url}/debrief`)
      .set('Authorization', `Bearer ${await t.tokenFor('lead')}`);
    expect(res.status).toBe(200);
    expect(pool.completed - before).toBe(1);
    expect(res.body.findings.length).toBeGreaterThan(0);
    expect(res.body.timeline.span.endSec).toBeGreaterThan(0);
  });
});
