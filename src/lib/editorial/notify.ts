import type { OutgoingMail } from './context';

/** The e-mails the editorial flow sends; plain text, links written out in full. */
export const mails = {
  submitted: (to: string, title: string, author: string, link: string): OutgoingMail => ({
    to,
    subject: `Review requested: ${title}`,
    text: `${author} submitted "${title}" for review.\n\nReview it: ${link}\n\nThe review queue lists everything waiting: ${link.replace(/\/recipes\/.*$/, '/review')}\n`,
  }),
  published: (to: string, title: string, curator: string, link: string): OutgoingMail => ({
    to,
    subject: `Published: ${title}`,
    text: `${curator} approved "${title}". It is now published and findable by everyone.\n\n${link}\n`,
  }),
  returned: (to: string, title: string, curator: string, comment: string, link: string): OutgoingMail => ({
    to,
    subject: `Returned for changes: ${title}`,
    text: `${curator} returned "${title}" to draft with these comments:\n\n${comment}\n\nEdit it: ${link}/edit\n`,
  }),
  retiredOwner: (to: string, title: string, reason: string, successor: string | null, link: string): OutgoingMail => ({
    to,
    subject: `Retired: ${title}`,
    text: `"${title}", which you own, was retired.\n\nReason: ${reason}\n${successor ? `Replaced by: ${successor}\n` : ''}\n${link}\n`,
  }),
  watchedRevision: (to: string, title: string, revision: number, link: string): OutgoingMail => ({
    to,
    subject: `New revision published: ${title}`,
    text: `Revision ${revision} of "${title}", which you watch, is now published.\n\n${link}\n\nStop watching on the recipe's page.\n`,
  }),
  watchedRetired: (to: string, title: string, reason: string, successor: string | null, link: string): OutgoingMail => ({
    to,
    subject: `Retired: ${title}`,
    text: `"${title}", which you watch, was retired.\n\nReason: ${reason}\n${successor ? `Use instead: ${successor}\n` : ''}\n${link}\n`,
  }),
  watchedFieldNote: (to: string, title: string, who: string, stars: number, note: string, link: string): OutgoingMail => ({
    to,
    subject: `Field note on ${title}`,
    text: `${who} rated "${title}" ${stars}/5 and wrote:\n\n${note}\n\n${link}\n`,
  }),
};
