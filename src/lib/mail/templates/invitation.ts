import type { MailMessage } from '../message';
import { ROLE_LABELS, type Role } from '../../auth/roles';

/** What an invitation says. */
export interface InvitationMail {
  to: string;
  name: string;
  role: Role;
  invitedBy: string;
  /** Link that opens the set-password page with the token. */
  url: string;
  /** When the link stops working. */
  expiresAt: Date;
}

/** The invitation e-mail: who invited you, as what, and the link that sets your password. */
export function invitationMail(m: InvitationMail): MailMessage {
  return {
    to: m.to,
    subject: 'You are invited to Loopwright, the Brindlewood controls recipe book',
    text: [
      `Hello ${m.name},`,
      '',
      `${m.invitedBy} has added you to Loopwright as ${ROLE_LABELS[m.role].toLowerCase()}.`,
      'Choose your password with this link to finish setting up your account:',
      '',
      m.url,
      '',
      `The link works once and until ${m.expiresAt.toUTCString()}.`,
      'If you did not expect this, you can ignore this message.',
    ].join('\n'),
  };
}
