import type { IncomingMessage } from 'node:http';
import type { Duplex } from 'node:stream';
import {
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import { simulatorQuerySchema } from '@upstroke/contracts';
import { WebSocketServer, type WebSocket } from 'ws';
import { startPacedLink } from './paced-link';
import { isDown, SimulatedDrops } from './simulated-drop';
import { simulatorSource } from './simulator';

export const SIMULATOR_PATH = '/api/link/simulator';

const reasons: Record<number, string> = {
  400: 'Bad Request',
  404: 'Not Found',
  503: 'Service Unavailable',
};

function refuse(socket: Duplex, status: number, message: string): void {
  socket.end(
    `HTTP/1.1 ${status} ${reasons[status]}\r\n` +
      `Content-Type: text/plain\r\nConnection: close\r\n\r\n${message}\n`,
  );
}

/**
 * Serves the monitor simulator over WebSocket on the API's own HTTP server (no token: the
 * data are invented training data). Other upgrade paths are left to other listeners.
 */
@Injectable()
export class LinkGateway implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('LinkGateway');
  private readonly wss = new WebSocketServer({ noServer: true, maxPayload: 64 * 1024 });
  private readonly stops = new Set<() => void>();
  private readonly drops = new SimulatedDrops();

  constructor(private readonly adapterHost: HttpAdapterHost) {}

  onApplicationBootstrap(): void {
    const server = this.adapterHost.httpAdapter.getHttpServer() as {
      on(event: 'upgrade', fn: (req: IncomingMessage, socket: Duplex, head: Buffer) => void): void;
    };
    server.on('upgrade', (req, socket, head) => this.upgrade(req, socket, head));
  }

  onApplicationShutdown(): void {
    for (const stop of this.stops) stop();
    for (const client of this.wss.clients) client.terminate();
    this.wss.close();
  }

  private upgrade(req: IncomingMessage, socket: Duplex, head: Buffer): void {
    const url = new URL(req.url ?? '/', 'http://link.invalid');
    if (url.pathname !== SIMULATOR_PATH) return;
    const query = simulatorQuerySchema.safeParse(Object.fromEntries(url.searchParams));
    if (!query.success) {
      const issue = query.error.issues[0];
      return refuse(socket, 400, `${issue.path.join('.')}: ${issue.message}`);
    }
    const q = query.data;
    const now = Date.now();
    const drop = this.drops.plan(url.search, q, now);
    if (drop && isDown(drop, q.speed, now))
      return refuse(socket, 503, 'monitor link down (simulated drop)');
    this.wss.handleUpgrade(req, socket, head, (ws: WebSocket) => {
      const src = simulatorSource(q);
      const fromIndex = Math.round(q.from * src.sampleRateHz);
      const stop = startPacedLink(ws, src, {
        speed: q.speed,
        fromIndex,
        anchorMs: drop?.anchorMs,
        silence: drop?.silence,
      });
      this.stops.add(stop);
      ws.on('close', () => {
        stop();
        this.stops.delete(stop);
      });
      ws.on('error', (e) => this.logger.warn(`simulator link: ${e.message}`));
    });
  }
}
