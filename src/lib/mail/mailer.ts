import nodemailer, { type Transporter } from 'nodemailer';
import { db } from '../db';
import { saveCaptured } from './captured';
import { startFakeSmtp } from './fake-smtp';
import { mailMessageSchema, type MailMessage } from './message';
import { mailSettings, type MailSettings } from './settings';

let transport: Promise<{ transporter: Transporter; from: string }> | undefined;

async function open(settings: MailSettings) {
  if (settings.kind === 'smtp') {
    const auth = settings.user ? { user: settings.user, pass: settings.pass ?? '' } : undefined;
    return { transporter: nodemailer.createTransport({ host: settings.host, port: settings.port, secure: settings.port === 465, auth }), from: settings.from };
  }
  // Demo and tests: an SMTP server inside this process that files every message in captured_mail.
  const fake = await startFakeSmtp((envelope, raw) => saveCaptured(db(), envelope, raw));
  const transporter = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
  return { transporter, from: settings.from };
}

/** The process's mail transport, opened (and the fake server started) on first use. */
function mailTransport() {
  transport ??= open(mailSettings()).catch((err: unknown) => {
    transport = undefined;
    throw err;
  });
  return transport;
}

/** Sends one plain-text message; resolves once the SMTP server has accepted it. */
export async function sendMail(message: MailMessage): Promise<void> {
  const m = mailMessageSchema.parse(message);
  const { transporter, from } = await mailTransport();
  await transporter.sendMail({ from, to: m.to, subject: m.subject, text: m.text });
}
