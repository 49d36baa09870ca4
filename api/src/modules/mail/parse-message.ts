import { type AddressObject, simpleParser } from 'mailparser';
import type { MailAttachment } from '@upstroke/contracts';

export interface ParsedMessage {
  subject: string | null;
  from: string | null;
  to: string[];
  text: string;
  attachments: MailAttachment[];
}

const options = { skipHtmlToText: true, skipTextLinks: true, skipImageLinks: true } as const;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list
    .flatMap((a) => a.value)
    .map((a) => (a.name ? `${a.name} <${a.address ?? ''}>` : (a.address ?? '')));
}

/**
 * A stored RFC 5322 message read by mailparser: encoded-word headers decoded (RFC 2047),
 * the plain-text body from its transfer encoding and character set, attachments listed
 * without their content.
 */
export async function parseMessage(raw: string): Promise<ParsedMessage> {
  const mail = await simpleParser(raw, options);
  return {
    subject: mail.subject ?? null,
    from: addresses(mail.from)[0] ?? null,
    to: addresses(mail.to),
    text: (mail.text ?? '').replace(/\r\n/g, '\n').trim(),
    attachments: mail.attachments.map((a) => ({
      filename: a.filename ?? null,
      contentType: a.contentType,
      sizeBytes: a.size,
    })),
  };
}
