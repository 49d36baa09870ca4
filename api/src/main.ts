import 'reflect-metadata';
import { createApp } from './app.factory';
import { loadConfig } from './config';
import { KNEX, type Db } from './db/knex';
import { startMailSink } from './modules/mail/mail-sink';

async function bootstrap(): Promise<void> {
  const config = loadConfig();
  const app = await createApp(config);
  if (config.smtpSinkPort) {
    const sink = await startMailSink(app.get<Db>(KNEX), config.smtpSinkPort);
    app.getHttpServer().on('close', () => sink.close());
  }
  await app.listen(config.port, '0.0.0.0');
}

bootstrap().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
