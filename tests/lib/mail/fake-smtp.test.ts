import { afterEach, describe, expect, it } from 'vitest';
import nodemailer from 'nodemailer';
import { startFakeSmtp, type FakeSmtp } from '../../../src/lib/mail/fake-smtp';
import { decodeMail } from '../../../src/lib/mail/decode';

let server: FakeSmtp | undefined;
afterEach(async () => {
  await server?.close();
  server = undefined;
});

/** Sends through nodemailer (the outside reference for the encoding) and returns what the fake server received. */
async function roundTrip(subject: string, text: string) {
  const caught: { envelope: { from: string; to: string[] }; raw: string }[] = [];
  server = await startFakeSmtp(async (envelope, raw) => void caught.push({ envelope, raw }));
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: server.port, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: 'Loopwright <loopwright@brindlewood.example>', to: 'ines.farrow@brindlewood.example', subject, text });
  return caught[0]!;
}

describe('startFakeSmtp', () => {
  it('accepts a message without sign-in and hands over its envelope', async () => {
    const got = await roundTrip('Plain subject', 'Plain body.');
    expect(got.envelope).toEqual({ from: 'loopwright@brindlewood.example', to: ['ines.farrow@brindlewood.example'] });
    expect(decodeMail(got.raw)).toEqual({ subject: 'Plain subject', body: 'Plain body.' });
  });
});

describe('decodeMail', () => {
  it('reads back non-ASCII subjects and bodies as nodemailer encodes them', async () => {
    const subject = 'Hold tube at 72 °C — check TIC-210';
    const text = 'Ramp the glycol setpoint to −4 °C.\nLink: http://127.0.0.1:4404/invite?token=Ab_9-xYz\n' + 'A long line '.repeat(20);
    const got = await roundTrip(subject, text);
    expect(decodeMail(got.raw)).toEqual({ subject, body: text.trimEnd() });
  });

  it('decodes base64 and Q encoded words (RFC 2047 examples of the same text)', () => {
    const raw = 'Subject: =?UTF-8?B?wrBD?= and =?UTF-8?Q?=C2=B0C_hot?=\r\nContent-Transfer-Encoding: base64\r\n\r\nwrBD\r\n';
    expect(decodeMail(raw)).toEqual({ subject: '°C and °C hot', body: '°C' });
  });
});
