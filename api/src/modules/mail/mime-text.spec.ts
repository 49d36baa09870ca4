import { plainTextOf } from './mime-text';

describe('plainTextOf', () => {
  it('decodes quoted-printable soft breaks and =XX escapes (RFC 2045 §6.7)', () => {
    const raw = [
      'Subject: x',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Link: http://h/set-password?token=3Dabc=',
      'def =E2=80=94 done',
    ].join('\r\n');
    expect(plainTextOf(raw)).toBe('Link: http://h/set-password?token=abcdef — done');
  });

  it('picks the text/plain part of a multipart message and decodes base64', () => {
    const raw = [
      'Content-Type: multipart/alternative; boundary="b1"',
      '',
      '--b1',
      'Content-Type: text/html',
      '',
      '<p>html</p>',
      '--b1',
      'Content-Type: text/plain',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('plain body\r\nline 2').toString('base64'),
      '--b1--',
    ].join('\r\n');
    expect(plainTextOf(raw)).toBe('plain body\nline 2');
  });

  it('answers an empty string when there is no text part', () => {
    expect(plainTextOf('Content-Type: image/png\r\n\r\nxxxx')).toBe('');
  });
});
