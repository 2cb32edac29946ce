import Database from 'better-sqlite3';
import type { RunningServer } from './server';

/** A message the server's fake SMTP server caught. */
export interface CaughtMail {
  to: string[];
  subject: string;
  body: string;
  receivedAt: string;
}

/** Every message the server has caught so far, oldest first (read from its database file). */
export function capturedMail(server: RunningServer): CaughtMail[] {
  const file = new Database(server.dbFile, { readonly: true, fileMustExist: true });
  try {
    const rows = file.prepare('select to_addresses, subject, body, received_at from captured_mail order by id').all() as Record<string, string>[];
    return rows.map((r) => ({ to: JSON.parse(r.to_addresses), subject: r.subject, body: r.body, receivedAt: r.received_at }));
  } finally {
    file.close();
  }
}

/** The newest message to `address`, or null. */
export function lastMailTo(server: RunningServer, address: string): CaughtMail | null {
  return capturedMail(server).filter((m) => m.to.includes(address.toLowerCase())).at(-1) ?? null;
}

/** The first link in a message that starts with `prefix` (e.g. `${server.url}/invite?token=`), or null. */
export function linkIn(mail: CaughtMail | null, prefix: string): string | null {
  return mail?.body.split(/\s+/).find((w) => w.startsWith(prefix)) ?? null;
}
