import type { Knex } from 'knex';
import { decodeMail } from './decode';

/** A message caught by the fake SMTP server, as /admin/mail shows it. */
export interface CapturedMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  body: string;
  receivedAt: string;
}

/** Stores one raw message with its envelope. */
export async function saveCaptured(knex: Knex, envelope: { from: string; to: string[] }, raw: string): Promise<void> {
  const { subject, body } = decodeMail(raw);
  await knex('captured_mail').insert({
    from_address: envelope.from,
    to_addresses: JSON.stringify(envelope.to),
    subject,
    body,
    raw,
    received_at: new Date().toISOString(),
  });
}

/** The newest captured messages first. */
export async function listCaptured(knex: Knex, limit = 200): Promise<CapturedMail[]> {
  const rows = await knex('captured_mail').orderBy('id', 'desc').limit(limit);
  return rows.map((r) => ({
    id: r.id,
    from: r.from_address,
    to: JSON.parse(r.to_addresses),
    subject: r.subject,
    body: r.body,
    receivedAt: r.received_at,
  }));
}
