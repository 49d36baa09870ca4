import type { AddressInfo } from 'node:net';
import { LIVE_FEED_PATH, type LiveFeedMessage, liveFeedMessageSchema } from '@upstroke/contracts';
import WebSocket from 'ws';
import { aResuscitation, anEtco2, anEvent } from './factories';
import { startTestApp, type TestApp } from './test-app';

/** A subscriber: the messages it received, and a way to wait for the next matching one. */
function subscribe(url: string, token: string, resuscitationId: string) {
  const ws = new WebSocket(url);
  const got: LiveFeedMessage[] = [];
  const waiters: (() => void)[] = [];
  ws.on('open', () => ws.send(JSON.stringify({ type: 'subscribe', token, resuscitationId })));
  ws.on('message', (data: Buffer) => {
    got.push(liveFeedMessageSchema.parse(JSON.parse(data.toString('utf8'))));
    waiters.splice(0).forEach((w) => w());
  });
  ws.on('close', () => waiters.splice(0).forEach((w) => w()));
  const until = async (check: (m: LiveFeedMessage[]) => boolean) => {
    while (!check(got) && ws.readyState <= WebSocket.OPEN)
      await new Promise<void>((r) => waiters.push(r));
    return got;
  };
  return { ws, got, until };
}

describe('live feed: entries pushed to the other tablets on the same record', () => {
  let t: TestApp;
  let url: string;
  beforeAll(async () => {
    t = await startTestApp();
    await t.app.listen(0, '127.0.0.1');
    const { port } = t.app.getHttpServer().address() as AddressInfo;
    url = `ws://127.0.0.1:${port}${LIVE_FEED_PATH}`;
  });
  afterAll(() => t.close());

  it('pushes a ROSC and a typed value stored from another tablet, to this record only', async () => {
    const token = await t.tokenFor('lead');
    const rec = aResuscitation();
    const other = aResuscitation();
    for (const r of [rec, other])
      await t.http().post('/api/resuscitations').set('Authorization', `Bearer ${token}`).send(r);
    const watcher = subscribe(url, token, rec.id);
    const bystander = subscribe(url, token, other.id);
    await watcher.until((m) => m.some((x) => x.type === 'subscribed'));
    await bystander.until((m) => m.some((x) => x.type === 'subscribed'));

    const rosc = anEvent('rosc', 300);
    const value = anEtco2(301, 35);
    const post = (path: string, body: object) =>
      t
        .http()
        .post(`/api/resuscitations/${rec.id}/${path}`)
        .set('Authorization', `Bearer ${token}`)
        .set('X-Device-Id', 'tablet-a')
        .send(body)
        .expect(201);
    await post('events/batch', { events: [rosc] });
    await post('etco2/batch', { samples: [value] });
    const got = await watcher.until((m) => m.filter((x) => x.type === 'entries').length >= 2);
    const entries = got.filter((m) => m.type === 'entries');
    expect(entries[0]).toMatchObject({
      resuscitationId: rec.id,
      events: [{ id: rosc.id, kind: 'rosc', at: rosc.at, data: {}, deviceId: 'tablet-a' }],
      etco2: [],
    });
    expect(entries[1]).toMatchObject({ etco2: [{ id: value.id, value: 35, unit: 'mmHg' }] });
    // A replay stores nothing and pushes nothing: the next message is the next new entry.
    await post('events/batch', { events: [rosc] });
    const note = anEvent('note', 302, { text: 'after the replay' });
    await post('events/batch', { events: [note] });
    const next = await watcher.until((m) => m.filter((x) => x.type === 'entries').length >= 3);
    expect(next.filter((m) => m.type === 'entries')[2]).toMatchObject({
      events: [{ id: note.id }],
    });
    expect(bystander.got.filter((m) => m.type === 'entries')).toEqual([]);
    watcher.ws.close();
    bystander.ws.close();
  });

  it('refuses a bad token and a record outside the user’s sites, and closes', async () => {
    const rec = aResuscitation();
    const token = await t.tokenFor('lead');
    await t.http().post('/api/resuscitations').set('Authorization', `Bearer ${token}`).send(rec);
    const bad = subscribe(url, 'not-a-token', rec.id);
    const refused = await bad.until((m) => m.some((x) => x.type === 'refused'));
    expect(refused).toEqual([{ type: 'refused', message: 'Sign in again' }]);
    const unknown = subscribe(url, token, '0b0c0d0e-0f10-4111-8213-141516171819');
    const absent = await unknown.until((m) => m.some((x) => x.type === 'refused'));
    expect(absent[0]).toMatchObject({ type: 'refused' });
  });
});
