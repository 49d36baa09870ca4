import nodemailer, { type Transporter } from 'nodemailer';
import type { AppConfig } from '../../config';

/** The one SMTP transport: first attempts and retries go out the same way. */
export function createSmtpTransport(smtp: Pick<AppConfig['smtp'], 'host' | 'port'>): Transporter {
  return nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: false,
    // The loopback sink offers no TLS; a hosted relay is configured with its own settings.
    ignoreTLS: smtp.host === '127.0.0.1' || smtp.host === 'localhost',
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
}
