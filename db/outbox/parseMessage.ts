/**
 * A small reader for the RFC 5322 messages the app itself sends (nodemailer output):
 * headers with folding (RFC 5322 §2.2.3), encoded words in headers (RFC 2047),
 * multipart bodies (RFC 2046 §5.1) and the base64 / quoted-printable transfer
 * encodings (RFC 2045 §6.7, §6.8). It is not a general-purpose mail parser: enough to
 * show in the outbox what really went over SMTP.
 */

export interface ParsedMessage {
  messageId: string | null;
  subject: string;
  from: string;
  to: string;
  textBody: string | null;
  htmlBody: string | null;
}

interface Part {
  headers: Map<string, string>;
  body: Buffer;
}

// Header bytes are read as UTF-8 (what SMTPUTF8 senders use); body bytes stay raw until decoded.
function splitHeadersAndBody(raw: Buffer): { head: string; body: Buffer } {
  const crlf = raw.indexOf('\r\n\r\n');
  const lf = raw.indexOf('\n\n');
  if (crlf === -1 && lf === -1) return { head: raw.toString('utf8'), body: Buffer.alloc(0) };
  if (crlf !== -1 && (lf === -1 || crlf < lf)) return { head: raw.subarray(0, crlf).toString('utf8'), body: raw.subarray(crlf + 4) };
  return { head: raw.subarray(0, lf).toString('utf8'), body: raw.subarray(lf + 2) };
}

/** Header names lower-cased; folded lines joined; the first occurrence wins. */
export function parseHeaders(head: string): Map<string, string> {
  const headers = new Map<string, string>();
  const unfolded = head.replace(/\r?\n(?=[ \t])/g, '');
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    if (!headers.has(name)) headers.set(name, line.slice(colon + 1).trim());
  }
  return headers;
}

function decodeBytes(bytes: Buffer, charset: string): string {
  try {
    return new TextDecoder(charset || 'utf-8').decode(bytes);
  } catch {
    // Unknown label: utf-8 is what the app sends anyway.
    return new TextDecoder('utf-8').decode(bytes);
  }
}

/** RFC 2045 §6.7: `=XX` octets and `=` soft line breaks. */
export function decodeQuotedPrintable(text: string): Buffer {
  const softBreaksRemoved = text.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < softBreaksRemoved.length; i++) {
    const ch = softBreaksRemoved.charCodeAt(i);
    if (ch === 0x3d && /^[0-9A-Fa-f]{2}$/.test(softBreaksRemoved.slice(i + 1, i + 3))) {
      bytes.push(parseInt(softBreaksRemoved.slice(i + 1, i + 3), 16));
      i += 2;
    } else {
      bytes.push(ch & 0xff);
    }
  }
  return Buffer.from(bytes);
}

/** RFC 2047 encoded words (`=?charset?B|Q?text?=`); whitespace between adjacent words is dropped (§6.2). */
export function decodeEncodedWords(value: string): string {
  const word = /=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g;
  const joined = value.replace(/(=\?[^?]+\?[BbQq]\?[^?]*\?=)\s+(?==\?[^?]+\?[BbQq]\?[^?]*\?=)/g, '$1');
  return joined.replace(word, (_match, charset: string, encoding: string, text: string) => {
    const cleanCharset = charset.split('*')[0];
    if (encoding.toUpperCase() === 'B') return decodeBytes(Buffer.from(text, 'base64'), cleanCharset);
    // In the Q encoding an underscore stands for a space (RFC 2047 §4.2).
    return decodeBytes(decodeQuotedPrintable(text.replace(/_/g, ' ')), cleanCharset);
  });
}

/** `type/subtype; key=value; key="quoted value"` → { type, params }. */
export function parseContentType(value: string | undefined): { type: string; params: Map<string, string> } {
  const params = new Map<string, string>();
  if (!value) return { type: 'text/plain', params };
  const [type, ...rest] = value.split(';');
  for (const piece of rest) {
    const eq = piece.indexOf('=');
    if (eq === -1) continue;
    const key = piece.slice(0, eq).trim().toLowerCase();
    let v = piece.slice(eq + 1).trim();
    if (v.startsWith('"') && v.endsWith('"')) v = v.slice(1, -1).replace(/\\(.)/g, '$1');
    params.set(key, v);
  }
  return { type: type.trim().toLowerCase(), params };
}

function decodeTransfer(body: Buffer, encoding: string | undefined): Buffer {
  switch ((encoding ?? '7bit').trim().toLowerCase()) {
    case 'base64':
      return Buffer.from(body.toString('latin1').replace(/[^A-Za-z0-9+/=]/g, ''), 'base64');
    case 'quoted-printable':
      return decodeQuotedPrintable(body.toString('latin1'));
    default:
      return body;
  }
}

function splitMultipart(body: Buffer, boundary: string): Buffer[] {
  const text = body.toString('latin1');
  const delimiter = `--${boundary}`;
  const parts: Buffer[] = [];
  const lines = text.split(/\r?\n/);
  let current: string[] | null = null;
  for (const line of lines) {
    const trimmed = line.trimEnd();
    if (trimmed === `${delimiter}--`) {
      if (current) parts.push(Buffer.from(current.join('\r\n'), 'latin1'));
      current = null;
      break;
    }
    if (trimmed === delimiter) {
      if (current) parts.push(Buffer.from(current.join('\r\n'), 'latin1'));
      current = [];
      continue;
    }
    if (current) current.push(line);
  }
  if (current) parts.push(Buffer.from(current.join('\r\n'), 'latin1'));
  return parts;
}

function parsePart(raw: Buffer): Part {
  const { head, body } = splitHeadersAndBody(raw);
  return { headers: parseHeaders(head), body };
}

/** Walks the part tree and keeps the first text/plain and the first text/html that are not attachments. */
function collectBodies(part: Part, found: { text: string | null; html: string | null }, depth = 0): void {
  const { type, params } = parseContentType(part.headers.get('content-type'));
  if (type.startsWith('multipart/') && params.get('boundary') && depth < 8) {
    for (const child of splitMultipart(part.body, params.get('boundary')!)) collectBodies(parsePart(child), found, depth + 1);
    return;
  }
  if (/^\s*attachment/i.test(part.headers.get('content-disposition') ?? '')) return;
  const decoded = decodeTransfer(part.body, part.headers.get('content-transfer-encoding'));
  const charset = params.get('charset') ?? 'utf-8';
  // On the wire every line ends in CRLF (RFC 5322 §2.1); stored text uses plain newlines.
  if (type === 'text/plain' && found.text === null) found.text = decodeBytes(decoded, charset).replace(/\r\n/g, '\n');
  else if (type === 'text/html' && found.html === null) found.html = decodeBytes(decoded, charset).replace(/\r\n/g, '\n');
}

export function parseMessage(raw: Buffer): ParsedMessage {
  const root = parsePart(raw);
  // A single-part message ends with the CRLF that precedes SMTP's end-of-data line; it is not
  // part of the text (in a multipart message the delimiter owns it, RFC 2046 §5.1.1).
  const rootType = parseContentType(root.headers.get('content-type')).type;
  if (!rootType.startsWith('multipart/')) {
    const end = root.body.length;
    if (end >= 2 && root.body[end - 2] === 0x0d && root.body[end - 1] === 0x0a) root.body = root.body.subarray(0, end - 2);
    else if (end >= 1 && root.body[end - 1] === 0x0a) root.body = root.body.subarray(0, end - 1);
  }
  const found: { text: string | null; html: string | null } = { text: null, html: null };
  collectBodies(root, found);
  const header = (name: string) => decodeEncodedWords(root.headers.get(name) ?? '');
  const messageId = root.headers.get('message-id')?.trim() || null;
  return {
    messageId,
    subject: header('subject'),
    from: header('from'),
    to: header('to'),
    textBody: found.text,
    htmlBody: found.html,
  };
}
