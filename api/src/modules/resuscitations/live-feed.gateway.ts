import type { IncomingMessage } from 'node:http';
import type { Duplex } from 'node:stream';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import { LIVE_FEED_PATH, type LiveFeedMessage, liveFeedSubscribeSchema } from '@upstroke/contracts';
import { type RawData, WebSocket, WebSocketServer } from 'ws';
import { AuthService } from '../auth/auth.service';
import { LiveFeed } from './live-feed';
import { ResuscitationAccess } from './resuscitation-access.service';

/** A socket that has not subscribed within this time is closed. */
const SUBSCRIBE_WITHIN_MS = 10_000;

/**
 * The live feed on the API's own HTTP server (beside the monitor simulator): a tablet opens
 * `/api/live-feed`, sends its token and the record it shows, and from then on receives every
 * entry the server accepts for that record. The same site scope as `GET …/entries` applies.
 */
@Injectable()
export class LiveFeedGateway implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('LiveFeedGateway');
  private readonly wss = new WebSocketServer({ noServer: true, maxPayload: 8 * 1024 });

  constructor(
    private readonly adapterHost: HttpAdapterHost,
    private readonly auth: AuthService,
    private readonly access: ResuscitationAccess,
    private readonly feed: LiveFeed,
  ) {}

  onApplicationBootstrap(): void {
    const server = this.adapterHost.httpAdapter.getHttpServer() as {
      on(event: 'upgrade', fn: (req: IncomingMessage, socket: Duplex, head: Buffer) => void): void;
    };
    server.on('upgrade', (req, socket, head) => {
      if (new URL(req.url ?? '/', 'http://feed.invalid').pathname !== LIVE_FEED_PATH) return;
      this.wss.handleUpgrade(req, socket, head, (ws) => this.serve(ws));
    });
  }

  onApplicationShutdown(): void {
    for (const client of this.wss.clients) client.terminate();
    this.wss.close();
  }

  private serve(ws: WebSocket): void {
    const send = (m: LiveFeedMessage) => {
      if (ws.readyState === WebSocket.OPEN) ws.send(JSON.stringify(m));
    };
    const timer = setTimeout(() => ws.close(4401, 'no subscription'), SUBSCRIBE_WITHIN_MS);
    let stop: (() => void) | null = null;
    ws.once('message', (raw: RawData) => {
      clearTimeout(timer);
      void this.subscribe(raw, send).then(
        (unsubscribe) => {
          if (ws.readyState !== WebSocket.OPEN) return unsubscribe();
          stop = unsubscribe;
        },
        (e: Error) => {
          send({ type: 'refused', message: e.message });
          ws.close(4403, 'refused');
        },
      );
    });
    ws.on('close', () => {
      clearTimeout(timer);
      stop?.();
    });
    ws.on('error', (e) => this.logger.warn(`live feed: ${e.message}`));
  }

  /** Checks the token and the record's site scope, then listens for the record's entries. */
  private async subscribe(raw: RawData, send: (m: LiveFeedMessage) => void) {
    let body: unknown;
    try {
      body = JSON.parse(rawText(raw));
    } catch {
      throw new Error('The first message must be JSON');
    }
    const parsed = liveFeedSubscribeSchema.safeParse(body);
    if (!parsed.success) throw new Error(`${parsed.error.issues[0].path.join('.')}: invalid`);
    const user = await this.auth.userForAccessToken(parsed.data.token);
    if (!user) throw new Error('Sign in again');
    const { resuscitationId } = parsed.data;
    await this.access.readable(user, resuscitationId);
    const unsubscribe = this.feed.subscribe(resuscitationId, send);
    send({ type: 'subscribed', resuscitationId });
    return unsubscribe;
  }
}

function rawText(raw: RawData): string {
  if (Array.isArray(raw)) return Buffer.concat(raw).toString('utf8');
  return Buffer.from(raw as ArrayBuffer).toString('utf8');
}
