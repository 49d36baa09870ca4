import request from 'supertest';
import { createApp } from '../src/app.factory';
import { loadConfig } from '../src/config';
import { startTestApp, type TestApp } from './test-app';

describe('health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('reports ok when PostgreSQL answers', async () => {
    const res = await t.http().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
  });

  it('answers 503 when PostgreSQL is unreachable', async () => {
    // A second app pointed at a port where no PostgreSQL listens: the server is "stopped".
    const down = await startTestAppWithoutDb();
    try {
      const res = await down.http().get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ status: 'degraded', db: 'down' });
    } finally {
      await down.close();
    }
  });
});

async function startTestAppWithoutDb() {
  const app = await createApp({
    ...loadConfig(),
    databaseUrl: 'postgres://postgres@127.0.0.1:1/none',
  });
  await app.init();
  return { http: () => request(app.getHttpServer()), close: () => app.close() };
}
