import nodemailer, { type SendMailOptions } from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { decodeEncodedWords, parseMimeMessage } from './mime-message';

// Round trip through nodemailer's own message composer (the writer our outbox uses), plus the
// RFC 2047 examples of section 8 of that RFC.

async function compose(mail: SendMailOptions): Promise<string> {
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });
  const info = await transport.sendMail(mail);
  return (info.message as Buffer).toString('utf8');
}

describe('parseMimeMessage', () => {
  it('reads subject, recipient, text and html of a multipart non-ASCII message', async () => {
    const long = 'long line '.repeat(20);
    const text = `Grüße aus dem Labor — ${long}\nLink: https://x.example/a?b=c`;
    const raw = await compose({
      from: 'Couplet <no-reply@couplet.example>',
      to: 'åsa@field.example',
      subject: 'Einladung: „Spulen“ prüfen',
      text,
      html: '<p>Grüße <a href="https://x.example/a?b=c">öffnen</a></p>',
    });
    const parsed = parseMimeMessage(raw);
    expect(parsed.subject).toBe('Einladung: „Spulen“ prüfen');
    expect(parsed.to).toContain('field.example');
    expect(parsed.text).toBe(text);
    expect(parsed.html).toBe('<p>Grüße <a href="https://x.example/a?b=c">öffnen</a></p>');
  });

  it('reads a plain single-part message', async () => {
    const raw = await compose({
      from: 'a@b.example',
      to: 'c@d.example',
      subject: 'Plain',
      text: 'Hello',
    });
    const parsed = parseMimeMessage(raw);
    expect(parsed).toMatchObject({ subject: 'Plain', text: 'Hello', html: null });
  });
});

describe('decodeEncodedWords (RFC 2047 §8 examples)', () => {
  it.each([
    ['=?ISO-8859-1?Q?a?=', 'a'],
    ['=?ISO-8859-1?Q?a?= b', 'a b'],
    ['=?ISO-8859-1?Q?a?= =?ISO-8859-1?Q?b?=', 'ab'],
    ['=?ISO-8859-1?Q?a_b?=', 'a b'],
    ['=?ISO-8859-1?Q?Andr=E9?= Pirard', 'André Pirard'],
  ])('%s → %s', (input, output) => {
    expect(decodeEncodedWords(input)).toBe(output);
  });
});
