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

/** Every value the pool hands back to the event loop, in order. */
function returnedBy(pool: WorkPool): unknown[] {
  const back: unknown[] = [];
  const run = pool.run.bind(pool) as (...a: unknown[]) => Promise<unknown>;
  jest.spyOn(pool, 'run').mockImplementation((async (...args: unknown[]) => {
    const result = await run(...args);
    back.push(result);
    return result;
  }) as WorkPool['run']);
  return back;
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
  afterEach(() => jest.restoreAllMocks());

  it('renders 4 PDFs in the worker pool while health keeps answering', async () => {
    const { url } = await signedRecord(t, true);
    const pool = t.app.get(WorkPool);
    const before = pool.completed;
    const back = returnedBy(pool);
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
    // Each download is one task (composed and rendered together) and only the file comes
    // back: the capnogram's samples never return to the event loop to be read and collected.
    expect(pool.completed - before).toBe(4);
    expect(back).toHaveLength(4);
    for (const b of back) {
      expect(b).toBeInstanceOf(Uint8Array);
      expect(
        Buffer.from(b as Uint8Array)
          .subarray(0, 5)
          .toString(),
      ).toBe('%PDF-');
    }
    expect(health.length).toBeGreaterThan(0);
    expect(health.every((s) => s === 200)).toBe(true);
  });

  it('composes the debrief of GET /debrief in a worker, without sending its capnogram back', async () => {
    const { url } = await signedRecord(t, true);
    const pool = t.app.get(WorkPool);
    const before = pool.completed;
    const back = returnedBy(pool);
    const res = await t
      .http()
      .get(`${url}/debrief`)
      .set('Authorization', `Bearer ${await t.tokenFor('lead')}`);
    expect(res.status).toBe(200);
    expect(pool.completed - before).toBe(1);
    expect(back).toEqual([expect.objectContaining({ findings: res.body.findings })]);
    expect(back[0]).not.toHaveProperty('waveform');
    expect(res.body.waveformTrace).toBeTruthy();
    expect(res.body.findings.length).toBeGreaterThan(0);
    expect(res.body.timeline.span.endSec).toBeGreaterThan(0);
  });
});
