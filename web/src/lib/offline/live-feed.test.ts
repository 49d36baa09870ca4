import { afterEach, describe, expect, it, vi } from 'vitest';
import { liveFeedUrl, openLiveFeed, RECONNECT_MS } from './live-feed';

const id = '7b2c3d4e-5f60-4a1b-8c2d-3e4f5a6b7c8d';

/** A stand-in socket: records what the client sends, lets the test play the server. */
class FakeSocket {
  static all: FakeSocket[] = [];
  sent: string[] = [];
  onopen: (() => void) | null = null;
  onmessage: ((e: { data: string }) => void) | null = null;
  onclose: (() => void) | null = null;
  constructor(public url: string) {
    FakeSocket.all.push(this);
  }
  send(s: string) {
    this.sent.push(s);
  }
  close() {
    this.onclose?.();
  }
}

afterEach(() => {
  vi.unstubAllGlobals();
  vi.useRealTimers();
  FakeSocket.all = [];
});

describe('live feed client', () => {
  it('subscribes with the token, hands on entries for its record, and reconnects after a drop', () => {
    vi.useFakeTimers();
    vi.stubGlobal('WebSocket', FakeSocket);
    const entries: unknown[] = [];
    const live: boolean[] = [];
    const close = openLiveFeed(
      id,
      () => 'tok',
      {
        onEntries: (e) => entries.push(e),
        onLive: (up) => live.push(up),
      },
      'ws://x/api/live-feed',
    );
    const ws = FakeSocket.all[0];
    ws.onopen?.();
    expect(JSON.parse(ws.sent[0])).toEqual({
      type: 'subscribe',
      token: 'tok',
      resuscitationId: id,
    });
    ws.onmessage?.({ data: JSON.stringify({ type: 'subscribed', resuscitationId: id }) });
    const rosc = {
      type: 'entries',
      resuscitationId: id,
      events: [{ id, at: '2026-03-04T10:05:00.000Z', kind: 'rosc', data: {}, deviceId: 'a' }],
      etco2: [],
    };
    ws.onmessage?.({ data: JSON.stringify(rosc) });
    ws.onmessage?.({ data: 'not json' });
    ws.onmessage?.({ data: JSON.stringify({ ...rosc, events: [{ id: 'x' }] }) });
    expect(entries).toEqual([rosc]);
    ws.onclose?.();
    expect(live).toEqual([true, false]);
    vi.advanceTimersByTime(RECONNECT_MS);
    expect(FakeSocket.all).toHaveLength(2);
    close();
    vi.advanceTimersByTime(RECONNECT_MS * 2);
    expect(FakeSocket.all).toHaveLength(2);
  });

  it('does not connect without a session; builds ws:// or wss:// from the page', () => {
    vi.stubGlobal('WebSocket', FakeSocket);
    openLiveFeed(id, () => null, { onEntries: () => {}, onLive: () => {} }, 'ws://x');
    expect(FakeSocket.all).toHaveLength(0);
    expect(liveFeedUrl({ protocol: 'https:', host: 'h.test' })).toBe('wss://h.test/api/live-feed');
    expect(liveFeedUrl({ protocol: 'http:', host: 'h:8080' })).toBe('ws://h:8080/api/live-feed');
  });
});
