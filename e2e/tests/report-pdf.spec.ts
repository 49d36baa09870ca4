import assert from 'node:assert/strict';
import { randomUUID } from 'node:crypto';
import { describe, it } from 'node:test';
import { baseUrl } from '../support/env';
import { apiToken } from '../support/live';

async function api(token: string, method: string, path: string, body?: unknown) {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return { status: res.status, bytes: Buffer.from(await res.arrayBuffer()) };
}

/**
 * The built app (`npm start` runs the API from compiled JavaScript) renders reports in its
 * worker threads: the worker file must be found beside the compiled service.
 */
describe('PDF report from the built app', () => {
  it('renders a signed record in the worker pool while health answers', async () => {
    const token = await apiToken('lead');
    const context = JSON.parse((await api(token, 'GET', '/context')).bytes.toString()) as {
      sites: { id: string }[];
    };
    const id = randomUUID();
    const arrest = Date.now() - 40 * 60_000;
    const at = (s: number) => new Date(arrest + s * 1000).toISOString();
    const created = await api(token, 'POST', '/resuscitations', {
      id,
      siteId: context.sites[0].id,
      arrestAt: at(0),
    });
    assert.equal(created.status, 201);
    const events = [
      ['arrest', 0, {}],
      ['compressions-start', 10, {}],
      ['shock', 120, { energyJ: 200 }],
      ['rosc', 400, {}],
      ['end', 600, { reason: 'rosc-sustained' }],
    ].map(([kind, s, data]) => ({ id: randomUUID(), kind, at: at(s as number), data }));
    assert.equal(
      (await api(token, 'POST', `/resuscitations/${id}/events/batch`, { events })).status,
      201,
    );
    const closing = {
      outcome: 'rosc-sustained',
      firstRhythm: 'vf',
      witnessed: true,
      monitored: true,
    };
    assert.equal((await api(token, 'PATCH', `/resuscitations/${id}`, closing)).status, 200);
    assert.equal((await api(token, 'POST', `/resuscitations/${id}/sign`)).status, 200);
    const [pdf, health] = await Promise.all([
      api(token, 'GET', `/resuscitations/${id}/report.pdf`),
      fetch(`${baseUrl}/api/health`),
    ]);
    assert.equal(pdf.status, 200);
    assert.equal(pdf.bytes.subarray(0, 5).toString(), '%PDF-');
    assert.equal(health.status, 200);
  });
});
