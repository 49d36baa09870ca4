import type { INestApplication } from '@nestjs/common';
import type { LoginResponse, Role } from '@upstroke/contracts';
import request from 'supertest';
import { createApp } from '../src/app.factory';
import { type AppConfig, loadConfig } from '../src/config';
import { KNEX, type Db } from '../src/db/knex';
import { seedOrganisation } from '../../db/seeds/demo-organisation';

export { demoSiteId, demoUnits, demoUsers, demoPassword } from '../../db/seeds/demo-organisation';

export interface TestApp {
  app: INestApplication;
  db: Db;
  http: () => ReturnType<typeof request>;
  tokenFor: (role: Role) => Promise<string>;
  close: () => Promise<void>;
}

/** Tables emptied before each test file, children first (TRUNCATE skips row triggers). */
const clinicalTables = [
  'mail_sink_messages',
  'audit_log',
  'waveform_chunks',
  'etco2_samples',
  'resuscitation_events',
  'resuscitations',
];

export async function resetDatabase(db: Db): Promise<void> {
  const existing = await db.raw<{ rows: { tablename: string }[] }>(
    "select tablename from pg_tables where schemaname = 'public' and tablename not like 'knex_%'",
  );
  const all = existing.rows.map((r) => r.tablename);
  const extra = all.filter((t) => !clinicalTables.includes(t));
  await db.raw(
    `truncate table ${[...clinicalTables.filter((t) => all.includes(t)), ...extra].map((t) => `"${t}"`).join(', ')} restart identity cascade`,
  );
  await seedOrganisation(db);
}

export async function startTestApp(overrides: Partial<AppConfig> = {}): Promise<TestApp> {
  const config = {
    ...loadConfig(),
    jwtSecret: 'test-secret',
    loginLimitPerMinute: 1000,
    loginIpLimitPerMinute: 1000,
    ...overrides,
  };
  const app = await createApp(config);
  await app.init();
  const db = app.get<Db>(KNEX);
  await resetDatabase(db);
  const tokens = new Map<Role, string>();
  const http = () => request(app.getHttpServer());
  return {
    app,
    db,
    http,
    async tokenFor(role) {
      const cached = tokens.get(role);
      if (cached) return cached;
      const res = await http()
        .post('/api/auth/login')
        .send({ email: `${role}@kestrel.test`, password: 'upstroke-demo' });
      const token = (res.body as LoginResponse).accessToken;
      tokens.set(role, token);
      return token;
    },
    close: () => app.close(),
  };
}
