/**
 * The local fake SMTP server: accepts every message on loopback and stores it in
 * `mail_outbox`, so the outbox shows exactly what went over the wire.
 */
import { SMTPServer, type SMTPServerAddress } from 'smtp-server';
import type { AddressInfo } from 'node:net';
import type { Sequelize } from 'sequelize';
import { initModels } from '../../models';
import { parseMessage } from './parseMessage';

/** Large enough for any message the app sends, small enough to refuse accidents. */
export const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

export interface FakeMailServer {
  port: number;
  close(): Promise<void>;
}

export interface StoredMailLog {
  id: number;
  to: string;
  subject: string;
}

function address(entry: SMTPServerAddress | false | undefined): string {
  return entry ? entry.address : '';
}

// Outbox rows need a text body; an HTML-only message gets a plain rendering of its HTML.
function htmlToText(html: string): string {
  return html
    .replace(/<(script|style)[\s\S]*?<\/\1>/gi, '')
    .replace(/<br\s*\/?>/gi, '\n')
    .replace(/<\/(p|div|h[1-6]|li|tr)>/gi, '\n')
    .replace(/<[^>]+>/g, '')
    .replace(/&nbsp;/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .trim();
}

export async function startFakeMailServer({
  sequelize,
  port,
  host = '127.0.0.1',
  onStored,
}: {
  sequelize: Sequelize;
  port: number;
  host?: string;
  onStored?: (entry: StoredMailLog) => void;
}): Promise<FakeMailServer> {
  const { MailMessage } = initModels(sequelize);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Ketbook local outbox',
    size: MAX_MESSAGE_BYTES,
    // On shutdown, idle client connections get one second before they are cut.
    closeTimeout: 1_000,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (error) => callback(error));
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error('Message exceeds the outbox size limit'), { responseCode: 552 }));
          return;
        }
        const parsed = parseMessage(Buffer.concat(chunks));
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
        const subject = parsed.subject.slice(0, 255);
        MailMessage.create({
          messageId: parsed.messageId ? parsed.messageId.slice(0, 255) : null,
          envelopeFrom: address(session.envelope.mailFrom).slice(0, 254),
          envelopeTo: envelopeTo.slice(0, 2000),
          subject,
          textBody: parsed.textBody ?? (parsed.htmlBody ? htmlToText(parsed.htmlBody) : ''),
          htmlBody: parsed.htmlBody,
          receivedAt: new Date(),
        })
          .then((row) => {
            onStored?.({ id: row.id, to: envelopeTo, subject });
            callback(null, `stored as outbox message ${row.id}`);
          })
          .catch((error: Error) => callback(Object.assign(error, { responseCode: 451 })));
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  // The server keeps running after a bad client; errors are reported, not fatal.
  server.on('error', (error) => console.error(`fake-mail-server: ${error.message}`));
  const actualPort = (server.server.address() as AddressInfo).port;
  return {
    port: actualPort,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
