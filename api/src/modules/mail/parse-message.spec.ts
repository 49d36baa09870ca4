import MailComposer from 'nodemailer/lib/mail-composer';
import { parseMessage } from './parse-message';

function compose(options: ConstructorParameters<typeof MailComposer>[0]): Promise<string> {
  return new Promise((resolve, reject) =>
    new MailComposer(options).compile().build((error, message) => {
      if (error) reject(error);
      else resolve(message.toString('utf8'));
    }),
  );
}

describe('parseMessage', () => {
  it('decodes an RFC 2047 encoded-word subject written by nodemailer', async () => {
    const subject = 'Draft — not signed: Resuscitation debrief — Kestrel Bay, 2 Dec 2026';
    const raw = await compose({ from: 'a@x.test', to: 'b@x.test', subject, text: 'hi' });
    expect(raw).toMatch(/^Subject: =\?UTF-8\?/m); // non-ASCII really was encoded (RFC 2047 §2)
    expect((await parseMessage(raw)).subject).toBe(subject);
  });

  it('decodes quoted-printable soft breaks and =XX escapes (RFC 2045 §6.7)', async () => {
    const raw = [
      'Subject: x',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Link: http://h/set-password?token=3Dabc=',
      'def =E2=80=94 done',
    ].join('\r\n');
    expect((await parseMessage(raw)).text).toBe('Link: http://h/set-password?token=abcdef — done');
  });

  it('lists attachments with name, type and decoded size, and keeps the text part', async () => {
    const pdf = Buffer.from('%PDF-1.7\n%fake but sized\n');
    const raw = await compose({
      from: 'Upstroke <no-reply@kestrel.test>',
      to: 'Ana Lead <ana@kestrel.test>, bo@kestrel.test',
      subject: 'Debrief',
      text: 'plain body\nline 2',
      attachments: [{ filename: 'record.pdf', content: pdf, contentType: 'application/pdf' }],
    });
    const parsed = await parseMessage(raw);
    expect(parsed.text).toBe('plain body\nline 2');
    expect(parsed.from).toBe('Upstroke <no-reply@kestrel.test>');
    expect(parsed.to).toEqual(['Ana Lead <ana@kestrel.test>', 'bo@kestrel.test']);
    expect(parsed.attachments).toEqual([
      { filename: 'record.pdf', contentType: 'application/pdf', sizeBytes: pdf.length },
    ]);
  });

  it('answers empty text and no attachments for a message without parts', async () => {
    const parsed = await parseMessage('Subject: only a header\r\n\r\n');
    expect(parsed).toMatchObject({ subject: 'only a header', text: '', attachments: [] });
  });
});
