/**
 * Server-side mail sending. Everything goes to the local fake SMTP server
 * (db/scripts/fake-mail-server.ts), which stores it in the admin's outbox.
 */
import nodemailer from 'nodemailer';
import { readSettings } from './config';

export const MAIL_FROM = 'Ketbook <no-reply@ketbook.example>';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Sends one message; resolves with the Message-ID once the SMTP server accepted it. */
export async function sendMail({ to, subject, text, html }: OutgoingMail): Promise<{ messageId: string }> {
  const { smtpHost, smtpPort } = readSettings();
  const transport = nodemailer.createTransport({
    host: smtpHost,
    port: smtpPort,
    // Loopback plain SMTP: no TLS to negotiate, and the fake server offers none.
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  try {
    const info = await transport.sendMail({ from: MAIL_FROM, to, subject, text, ...(html ? { html } : {}) });
    return { messageId: String(info.messageId) };
  } finally {
    transport.close();
  }
}
