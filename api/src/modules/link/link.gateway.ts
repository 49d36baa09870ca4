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
import { simulatorSource } from './simulator';

export const SIMULATOR_PATH = '/api/link/simulator';

function refuse(socket: Duplex, status: number, message: string): void {
  socket.end(
    `HTTP/1.1 ${status} ${status === 400 ? 'Bad Request' : 'Not Found'}\r\n` +
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
    this.wss.handleUpgrade(req, socket, head, (ws: WebSocket) => {
      const src = simulatorSource(query.data);
      const fromIndex = Math.round(query.data.from * src.sampleRateHz);
      const stop = startPacedLink(ws, src, { speed: query.data.speed, fromIndex });
      this.stops.add(stop);
      ws.on('close', () => {
        stop();
        this.stops.delete(stop);
      });
      ws.on('error', (e) => this.logger.warn(`simulator link: ${e.message}`));
    });
  }
}
