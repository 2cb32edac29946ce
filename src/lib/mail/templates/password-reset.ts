import type { MailMessage } from '../message';

/** What a password-reset message says. */
export interface PasswordResetMail {
  to: string;
  name: string;
  /** Link that opens the new-password page with the token. */
  url: string;
  /** How long the link works, in minutes. */
  validMinutes: number;
}

/** The password-reset e-mail. */
export function passwordResetMail(m: PasswordResetMail): MailMessage {
  return {
    to: m.to,
    subject: 'Choose a new Loopwright password',
    text: [
      `Hello ${m.name},`,
      '',
      'Someone (hopefully you) asked to reset the password of your Loopwright account.',
      'Choose a new one with this link:',
      '',
      m.url,
      '',
      `The link works once and for ${m.validMinutes} minutes. Your other sessions will be signed out.`,
      'If you did not ask for this, ignore this message; your password stays as it is.',
    ].join('\n'),
  };
}
