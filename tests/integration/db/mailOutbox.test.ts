import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { initModels, type Models } from '../../../models';
import { MAIL_FROM, sendMail } from '../../../db/mail';
import { startFakeMailServer, type FakeMailServer } from '../../../db/outbox/fakeMailServer';
import { createMigrator } from '../../../db/umzug';
import { createScratchDatabase, type ScratchDatabase } from './scratchDatabase';

// A real SMTP conversation: nodemailer (db/mail.ts) → smtp-server on an ephemeral port → a row.
let scratch: ScratchDatabase;
let models: Models;
let server: FakeMailServer;
const stored: { id: number; subject: string }[] = [];
const previousPort = process.env.KETBOOK_SMTP_PORT;

beforeAll(async () => {
  scratch = await createScratchDatabase();
  await createMigrator(scratch.sequelize).up();
  models = initModels(scratch.sequelize);
  server = await startFakeMailServer({ sequelize: scratch.sequelize, port: 0, onStored: (e) => stored.push(e) });
  process.env.KETBOOK_SMTP_PORT = String(server.port);
});
afterEach(async () => {
  await models.MailMessage.destroy({ where: {} });
});
afterAll(async () => {
  if (previousPort === undefined) delete process.env.KETBOOK_SMTP_PORT;
  else process.env.KETBOOK_SMTP_PORT = previousPort;
  await server?.close();
  await scratch?.drop();
});

describe('sendMail through the fake SMTP server', () => {
  it('stores subject, envelope, text and HTML of a multipart message', async () => {
    const text = `Ines invited you to the Larkspur Correlation Group.\nOpen: http://127.0.0.1:3100/invitations/abc?x=1&y=2\n${'long line '.repeat(20)}`;
    const html = '<p>Ines invited you. <a href="http://127.0.0.1:3100/invitations/abc?x=1&amp;y=2">Accept</a></p>';
    const { messageId } = await sendMail({ to: 'mei@larkspur.example', subject: 'Join Larkspur on Ketbook', text, html });
    const row = await models.MailMessage.findOne({ where: { messageId } });
    expect(row).not.toBeNull();
    expect(row!.subject).toBe('Join Larkspur on Ketbook');
    expect(row!.envelopeTo).toBe('mei@larkspur.example');
    expect(row!.envelopeFrom).toBe('no-reply@ketbook.example');
    expect(MAIL_FROM).toBe('Ketbook <no-reply@ketbook.example>');
    expect(row!.textBody.trimEnd()).toBe(text.trimEnd());
    expect(row!.htmlBody).toBe(html);
    expect(row!.receivedAt).toBeInstanceOf(Date);
    expect(Math.abs(row!.receivedAt.getTime() - Date.now())).toBeLessThan(60_000);
    expect(stored.some((e) => e.id === row!.id)).toBe(true);
    await row!.destroy();
  });

  it('keeps non-ASCII subject and body intact, and a text-only message has no HTML', async () => {
    const subject = 'Réinitialisation — Passwort zurücksetzen ✓ Ω';
    const text = 'Grüße aus Halvard: ½ ⟨Ψ|Ĥ|Ψ⟩ = −1.137 hartree';
    const { messageId } = await sendMail({ to: 'tomasz@larkspur.example', subject, text });
    const row = await models.MailMessage.findOne({ where: { messageId } });
    expect(row!.subject).toBe(subject);
    expect(row!.textBody.trimEnd()).toBe(text);
    expect(row!.htmlBody).toBeNull();
    await row!.destroy();
    expect(await models.MailMessage.count()).toBe(0);
  });

  it('rejects the send when no SMTP server listens (so callers see the failure)', async () => {
    const port = server.port;
    await server.close();
    await expect(sendMail({ to: 'mei@larkspur.example', subject: 'x', text: 'y' })).rejects.toThrow();
    server = await startFakeMailServer({ sequelize: scratch.sequelize, port, onStored: (e) => stored.push(e) });
    expect(await models.MailMessage.count()).toBe(0);
  });
});
