import { SMTPServer } from 'smtp-server';
import type { AddressInfo } from 'node:net';

/** A running in-process SMTP server that accepts every message. */
export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

/**
 * Starts a local SMTP server on 127.0.0.1 and a free port (demo and test mode): no sign-in,
 * no STARTTLS, every message handed to `onMessage` with its envelope.
 */
export function startFakeSmtp(onMessage: (envelope: { from: string; to: string[] }, raw: string) => Promise<void>): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        const to = session.envelope.rcptTo.map((r) => r.address);
        onMessage({ from, to }, Buffer.concat(chunks).toString('utf8')).then(() => callback(), (err: Error) => callback(err));
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.server.address() as AddressInfo;
      resolve({ port, close: () => new Promise<void>((r) => server.close(() => r())) });
    });
  });
}
