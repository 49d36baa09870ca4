import { Logger } from '@nestjs/common';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../../db/knex';
import { parseMessage } from './parse-message';

const maxBytes = 30 * 1024 * 1024;

/** The decoded subject for the list; a message mailparser cannot read is still kept. */
async function subjectOf(raw: string): Promise<string | null> {
  return parseMessage(raw).then(
    (m) => m.subject,
    () => null,
  );
}

/**
 * The local SMTP sink: accepts every message on loopback and keeps it in the database so
 * that admins can read it in the app. It never relays mail anywhere.
 */
export function startMailSink(db: Db, port: number, host = '127.0.0.1'): Promise<SMTPServer> {
  const logger = new Logger('MailSink');
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: maxBytes,
    logger: false,
    onData(stream, session, callback) {
      const parts: Buffer[] = [];
      stream.on('data', (b: Buffer) => parts.push(b));
      stream.on('end', () => {
        const raw = Buffer.concat(parts).toString('utf8');
        const from = session.envelope.mailFrom;
        subjectOf(raw)
          .then((subject) =>
            db('mailSinkMessages').insert({
              mailFrom: from ? from.address : null,
              rcptTo: session.envelope.rcptTo.map((r) => r.address),
              subject,
              raw,
              sizeBytes: Buffer.byteLength(raw),
            }),
          )
          .then(
            () => callback(),
            (error: Error) => callback(error),
          );
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      logger.log(`SMTP sink listening on ${host}:${port}`);
      resolve(server);
    });
  });
}
