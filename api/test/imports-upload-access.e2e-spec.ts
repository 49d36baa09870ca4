import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { demoUsers } from './test-app';
import { startTestApp, type TestApp } from './test-app';

const declared = 40 * 1024 * 1024; // under the 50 MB limit, so only access can refuse it
const sent = 1024 * 1024;

/**
 * Starts a 40 MB multipart upload, sends 1 MB of it and waits for the answer. The answer
 * can only come before the rest is sent if the API refused without reading the body.
 */
function partialUpload(port: number, path: string, token?: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const boundary = 'upstroke-test-boundary';
    const req = http.request({
      host: '127.0.0.1',
      port,
      path,
      method: 'POST',
      headers: {
        'Content-Type': `multipart/form-data; boundary=${boundary}`,
        'Content-Length': String(declared),
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
    });
    req.on('response', (res) => {
      res.resume();
      resolve(res.statusCode ?? 0);
      req.destroy();
    });
    req.on('error', (e) => reject(e));
    req.write(
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\n` +
        'Content-Type: text/csv\r\n\r\n',
    );
    req.write(Buffer.alloc(sent, 0x41));
    // The rest is never sent: without an early answer this test times out and fails.
  });
}

describe('uploads are refused before the body is read', () => {
  let t: TestApp;
  let port: number;
  const otherSiteRecord = randomUUID();
  beforeAll(async () => {
    t = await startTestApp();
    const server = t.app.getHttpServer() as http.Server;
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    port = (server.address() as AddressInfo).port;
    const siteId = randomUUID();
    await t.db('sites').insert({ id: siteId, name: 'Another Hospital' });
    await t.db('resuscitations').insert({
      id: otherSiteRecord,
      siteId,
      arrestAt: new Date('2026-03-04T10:00:00Z'),
      createdBy: demoUsers.find((u) => u.role === 'lead')!.id,
    });
  });
  afterAll(() => t.close());

  it('answers 404 for a record of another site after 1 MB of a 40 MB upload', async () => {
    const status = await partialUpload(
      port,
      `/api/resuscitations/${otherSiteRecord}/imports`,
      await t.tokenFor('lead'),
    );
    expect(status).toBe(404);
  }, 60_000);

  it('answers 401 without a token and 400 for a malformed id, also before the body', async () => {
    expect(await partialUpload(port, `/api/resuscitations/${otherSiteRecord}/imports`)).toBe(401);
    const lead = await t.tokenFor('lead');
    expect(await partialUpload(port, '/api/resuscitations/not-an-id/imports', lead)).toBe(400);
  }, 60_000);
});
