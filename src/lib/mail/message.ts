import { z } from 'zod';

/** One e-mail Loopwright sends: plain text, one recipient. */
export const mailMessageSchema = z.object({
  /** Recipient address. */
  to: z.email(),
  /** Subject line, one line of plain text. */
  subject: z.string().min(1).max(200).regex(/^[^\r\n]*$/, 'A subject is one line.'),
  /** Plain-text body; links are written out in full. */
  text: z.string().min(1),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;
