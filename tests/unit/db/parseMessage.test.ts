import { describe, expect, it } from 'vitest';
import nodemailer from 'nodemailer';
import {
  decodeEncodedWords,
  decodeQuotedPrintable,
  parseContentType,
  parseHeaders,
  parseMessage,
} from '../../../db/outbox/parseMessage';

// The reference for whole messages is nodemailer itself (a general-purpose npm library): it
// composes a message the way the app's mail goes out, and the parser must recover the parts.
async function compose(options: Record<string, unknown>): Promise<Buffer> {
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
  const info = await transport.sendMail({ from: 'Ketbook <no-reply@ketbook.example>', ...options });
  return info.message as Buffer;
}

describe('parseMessage on nodemailer output', () => {
  it('reads a text + HTML multipart/alternative message', async () => {
    const text = 'First line\nSecond line with = sign and a tab\t.\n' + 'word '.repeat(40);
    const html = '<p>Hello <b>there</b> &amp; welcome</p>';
    const raw = await compose({ to: 'mei@larkspur.example', subject: 'Plain subject', text, html, messageId: '<m1@ketbook.example>' });
    expect(raw.toString('latin1')).toContain('multipart/alternative');
    const parsed = parseMessage(raw);
    expect(parsed.subject).toBe('Plain subject');
    expect(parsed.messageId).toBe('<m1@ketbook.example>');
    expect(parsed.to).toBe('mei@larkspur.example');
    expect(parsed.from).toBe('Ketbook <no-reply@ketbook.example>');
    expect(parsed.textBody).toBe(text);
    expect(parsed.htmlBody).toBe(html);
  });

  it('decodes UTF-8 subjects and bodies in quoted-printable and base64', async () => {
    const subject = 'Grüße — ⟨Ψ|Ĥ|Ψ⟩ ≈ −1.137 hartree, ünd a long subject line that has to be folded by the composer';
    const text = 'Energie: −1.137 Eₕ\nÅngström, ½, 😀\n' + 'é'.repeat(120);
    for (const textEncoding of ['quoted-printable', 'base64']) {
      const raw = await compose({ to: 'x@example.test', subject, text, html: `<p>${text}</p>`, textEncoding });
      expect(raw.toString('latin1')).toContain(`Content-Transfer-Encoding: ${textEncoding}`);
      const parsed = parseMessage(raw);
      expect(parsed.subject).toBe(subject);
      expect(parsed.textBody).toBe(text);
      expect(parsed.htmlBody).toBe(`<p>${text}</p>`);
    }
  });

  it('takes the text part of a message with an attachment and skips the attachment', async () => {
    const raw = await compose({
      to: 'x@example.test',
      subject: 'With file',
      text: 'See the attached run file.',
      attachments: [{ filename: 'run.json', content: '{"format":"ketbook-run/1"}', contentType: 'text/plain' }],
    });
    const parsed = parseMessage(raw);
    expect(parsed.textBody).toBe('See the attached run file.');
    expect(parsed.htmlBody).toBeNull();
  });

  it('reads a single-part text message and an HTML-only message', async () => {
    const textOnly = parseMessage(await compose({ to: 'x@example.test', subject: 's', text: 'only text' }));
    expect([textOnly.textBody, textOnly.htmlBody]).toEqual(['only text', null]);
    const htmlOnly = parseMessage(await compose({ to: 'x@example.test', subject: 's', html: '<i>only html</i>' }));
    expect([htmlOnly.textBody, htmlOnly.htmlBody]).toEqual([null, '<i>only html</i>']);
  });
});

describe('header and transfer decoding', () => {
  it('decodes the encoded words of RFC 2047 §8', () => {
    // from memory of RFC 2047 §8 (examples)
    expect(decodeEncodedWords('=?ISO-8859-1?Q?Andr=E9?= Pirard')).toBe('André Pirard');
    expect(decodeEncodedWords('=?ISO-8859-1?Q?a?= =?ISO-8859-1?Q?b?=')).toBe('ab');
    expect(decodeEncodedWords('=?ISO-8859-1?Q?a?= b')).toBe('a b');
    expect(decodeEncodedWords('=?ISO-8859-1?Q?a_b?=')).toBe('a b');
    expect(decodeEncodedWords('=?ISO-8859-2?Q?a_b?=')).toBe('a b');
    // "If you can read this you understand the example." (RFC 2047 §8, base64 words)
    expect(
      decodeEncodedWords('=?ISO-8859-1?B?SWYgeW91IGNhbiByZWFkIHRoaXMgeW8=?= =?ISO-8859-2?B?dSB1bmRlcnN0YW5kIHRoZSBleGFtcGxlLg==?='),
    ).toBe('If you can read this you understand the example.');
  });

  it('decodes quoted-printable soft breaks and octets (RFC 2045 §6.7)', () => {
    // common practice, no source: "=C3=A9" is the UTF-8 encoding of é; "=\r\n" is a soft break
    expect(decodeQuotedPrintable('caf=C3=A9 =3D ok=\r\n joined').toString('utf8')).toBe('café = ok joined');
  });

  it('unfolds headers and reads content-type parameters', () => {
    const headers = parseHeaders('Subject: one\r\n two\r\nContent-Type: multipart/alternative;\r\n boundary="--_b=1"');
    expect(headers.get('subject')).toBe('one two');
    const ct = parseContentType(headers.get('content-type'));
    expect(ct.type).toBe('multipart/alternative');
    expect(ct.params.get('boundary')).toBe('--_b=1');
  });
});
