import type { SMTPServer } from 'smtp-server';
import { startMailSink } from '../../src/modules/mail/mail-sink';
import { parseMessage } from '../../src/modules/mail/parse-message';
import type { LoginResponse } from '@upstroke/contracts';
import { freePort } from '../free-port';
import { demoPassword, startTestApp, type TestApp } from '../test-app';

export interface AdminTestApp extends TestApp {
  as: (role: 'recorder' | 'lead' | 'quality' | 'admin') => Promise<readonly [string, string]>;
  /** The set-password token from the newest message the sink received for `email`. */
  linkTokenFor: (email: string) => Promise<string>;
}

/** The API with a local SMTP sink on a free port. */
export async function startAdminTestApp(): Promise<AdminTestApp> {
  const smtpPort = await freePort();
  const base = await startTestApp({
    smtp: { host: '127.0.0.1', port: smtpPort, from: 'Upstroke <no-reply@kestrel.test>' },
    publicUrl: 'http://upstroke.test',
  });
  const sink: SMTPServer = await startMailSink(base.db, smtpPort);
  return {
    ...base,
    // A fresh sign-in each time: these tests revoke tokens on purpose.
    as: async (role) => {
      const res = await base
        .http()
        .post('/api/auth/login')
        .send({ email: `${role}@kestrel.test`, password: demoPassword });
      return ['Authorization', `Bearer ${(res.body as LoginResponse).accessToken}`] as const;
    },
    async linkTokenFor(email) {
      const row = await base
        .db('mailSinkMessages')
        .whereRaw('? = any(rcpt_to)', [email])
        .orderBy('id', 'desc')
        .first<{ raw: string }>('raw');
      const match = /set-password\?token=([A-Za-z0-9_-]+)/.exec(
        (await parseMessage(row?.raw ?? '')).text,
      );
      if (!match) throw new Error(`no set-password link for ${email}`);
      return match[1];
    },
    close: async () => {
      await new Promise<void>((resolve) => sink.close(() => resolve()));
      await base.close();
    },
  };
}
