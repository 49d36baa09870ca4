import fs from 'node:fs';
import path from 'node:path';
import { type INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import express, { type NextFunction, type Request, type Response } from 'express';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import { AppModule } from './app.module';
import type { AppConfig } from './config';

function serveWeb(app: NestExpressApplication, webDist: string): void {
  const index = path.join(webDist, 'index.html');
  app.use(
    express.static(webDist, {
      index: false,
      setHeaders: (res, file) => {
        // The service worker and the shell must be revalidated so updates reach tablets.
        const base = path.basename(file);
        if (base === 'sw.js' || base === 'index.html' || base.endsWith('.webmanifest'))
          res.setHeader('Cache-Control', 'no-cache');
        else if (file.includes(`${path.sep}assets${path.sep}`))
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      },
    }),
  );
  app.use((req: Request, res: Response, next: NextFunction) => {
    if (req.method !== 'GET' || req.path.startsWith('/api') || !fs.existsSync(index)) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}

/** Builds the configured application (used by main.ts and by the integration tests). */
export async function createApp(config: AppConfig): Promise<INestApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.register(config), {
    bufferLogs: true,
    cors: false,
  });
  app.useLogger(app.get(Logger));
  app.set('trust proxy', config.trustProxy);
  app.useBodyParser('json', { limit: '20mb' });
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'connect-src': ["'self'", 'ws:', 'wss:'],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'worker-src': ["'self'", 'blob:'],
          // Ward tablets may reach a local server over plain HTTP: never rewrite to https.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.setGlobalPrefix('api');
  const docs = new DocumentBuilder()
    .setTitle('Upstroke API')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  SwaggerModule.setup('api/docs', app, () => SwaggerModule.createDocument(app, docs));
  if (config.webDist) serveWeb(app, config.webDist);
  app.enableShutdownHooks();
  return app;
}
