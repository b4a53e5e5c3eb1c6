import { z } from 'zod';

/**
 * The kinds of mail Scanwright sends, each of which a person can turn off on its own (account page, or the
 * one-click link at the foot of every such mail, RFC 8058). `review` is sent even to people who turned off
 * non-essential mail, because a decision on one's own work may ask them to act.
 */
export const MAIL_KINDS = ['review', 'messages', 'comments', 'follows', 'account'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const mailKindLabels: Record<MailKind, { title: string; what: string }> = {
  review: {
    title: 'Review of your work',
    what: 'Decisions on your builds, runs, parts and reports, and posts in your builds’ review threads.',
  },
  messages: { title: 'Exchange messages', what: 'New messages about listings, yours or ones you asked about.' },
  comments: { title: 'Comments on your builds', what: 'When someone comments on one of your published builds.' },
  follows: {
    title: 'What you follow',
    what: 'New log entries on builds, newly counted runs on parts and new builds by makers you follow.',
  },
  account: { title: 'About your account', what: 'The welcome note when you first sign in.' },
};

/** Stored as a comma-separated list of kinds turned off; anything unknown is dropped. */
export function parseMailOff(stored: string): Set<MailKind> {
  return new Set(stored.split(',').filter((k): k is MailKind => (MAIL_KINDS as readonly string[]).includes(k)));
}
export const formatMailOff = (off: Iterable<MailKind>) => MAIL_KINDS.filter((k) => new Set(off).has(k)).join(',');

/** Which kinds are on, as the account settings answer shows them. */
export type MailChoices = Record<MailKind, boolean>;

export const mailKindSchema = z.enum(MAIL_KINDS);

/** The one-click unsubscribe address's parts: whose, which kind, and the signature that proves the link came in their mail. */
export const unsubscribeParams = z.strictObject({
  userId: z.coerce.number().int().positive(),
  kind: mailKindSchema,
  token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'Not an unsubscribe token.'),
});
export type UnsubscribeParams = z.infer<typeof unsubscribeParams>;

/** What the unsubscribe page shows before and after the click. */
export interface UnsubscribeStateDto {
  kind: MailKind;
  title: string;
  /** Whether mails of this kind still go out. */
  on: boolean;
}
