import 'server-only';
import { getModels } from '../server/db';

export interface MailSummary {
  id: number;
  subject: string;
  to: string;
  from: string;
  receivedAt: string;
}

export interface MailDetail extends MailSummary {
  messageId: string | null;
  textBody: string;
  hasHtml: boolean;
}

type MailLike = {
  id: number;
  messageId: string | null;
  envelopeFrom: string;
  envelopeTo: string;
  subject: string;
  textBody: string | null;
  htmlBody: string | null;
  receivedAt: Date;
};

function summary(m: MailLike): MailSummary {
  return { id: m.id, subject: m.subject, to: m.envelopeTo, from: m.envelopeFrom, receivedAt: new Date(m.receivedAt).toISOString() };
}

export async function listOutbox({ limit = 200 }: { limit?: number } = {}): Promise<MailSummary[]> {
  const { MailMessage } = getModels();
  const rows = await MailMessage.findAll({
    order: [['receivedAt', 'DESC'], ['id', 'DESC']],
    limit,
    attributes: ['id', 'messageId', 'envelopeFrom', 'envelopeTo', 'subject', 'receivedAt'],
  });
  return rows.map((r) => summary(r as unknown as MailLike));
}

export async function getOutboxMessage({ id }: { id: number }): Promise<MailDetail | null> {
  const { MailMessage } = getModels();
  const m = (await MailMessage.findByPk(id)) as unknown as MailLike | null;
  if (!m) return null;
  return { ...summary(m), messageId: m.messageId ?? null, textBody: m.textBody ?? '', hasHtml: Boolean(m.htmlBody) };
}
