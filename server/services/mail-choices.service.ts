// Per-kind mail choices and the one-click unsubscribe links that come with each mail (RFC 8058,
// "Signaling One-Click Functionality for List Email Headers"; the header itself is RFC 2369's List-Unsubscribe).
// A link names the person and the kind and carries an HMAC-SHA256 (RFC 2104) of both under a random per-person key,
// so it works without signing in and cannot be made for someone else. Opening the link (GET) changes nothing
// (RFC 8058 §3.2: mail scanners fetch links); the POST does.
import { createHmac, timingSafeEqual } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import {
  MAIL_KINDS,
  formatMailOff,
  mailKindLabels,
  parseMailOff,
  type MailChoices,
  type MailKind,
  type UnsubscribeParams,
  type UnsubscribeStateDto,
} from '@shared/schemas/mail-choices.ts';
import { User } from '../models/user.model.ts';
import { AppError, NotFoundError } from '../errors.ts';
import { APP_URL } from './outbox-placeholders.ts';

const sign = (key: string, userId: number, kind: MailKind) =>
  createHmac('sha256', key).update(`unsubscribe:${userId}:${kind}`).digest('base64url').slice(0, 32);

const linksFor = (userId: number, key: string, kind: MailKind): UnsubscribeLinks => {
  const tail = `${userId}/${kind}/${sign(key, userId, kind)}`;
  return { oneClick: `${APP_URL}/api/mail/unsubscribe/${tail}`, page: `${APP_URL}/mail/stop/${tail}` };
};

export interface UnsubscribeLinks {
  /** The one-click POST target for List-Unsubscribe (RFC 8058). */
  oneClick: string;
  /** The page a person opens from the mail's footer: it says what stops and asks them to confirm. */
  page: string;
}

/**
 * Whether mail of this kind may go to this person, and the links to stop it, from one read of their row (inside the
 * sender's transaction). The signing key is made with the account (model default; the migration filled older ones),
 * so nothing here writes: a write to the users row inside a decision's transaction would upgrade the shared lock its
 * foreign-key checks hold, and two decisions about one maker's work would deadlock.
 */
export async function mailingFor(
  userId: number,
  kind: MailKind,
  transaction?: Transaction,
): Promise<{ wanted: boolean; links: UnsubscribeLinks | null }> {
  const user = await User.findByPk(userId, { attributes: ['id', 'mailOff', 'mailKey'], transaction });
  if (!user) return { wanted: false, links: null };
  return { wanted: !parseMailOff(user.mailOff).has(kind), links: user.mailKey ? linksFor(user.id, user.mailKey, kind) : null };
}

/** Both addresses for one person and kind, with the app's address left as the outbox placeholder. */
export async function unsubscribeLinks(userId: number, kind: MailKind, transaction?: Transaction): Promise<UnsubscribeLinks | null> {
  return (await mailingFor(userId, kind, transaction)).links;
}

async function checkedUser(params: UnsubscribeParams): Promise<User> {
  const user = await User.findByPk(params.userId, { attributes: ['id', 'mailKey', 'mailOff'] });
  const expected = user?.mailKey ? Buffer.from(sign(user.mailKey, user.id, params.kind)) : null;
  const sent = Buffer.from(params.token);
  if (!user || !expected || expected.length !== sent.length || !timingSafeEqual(expected, sent)) {
    throw new AppError(404, 'bad_unsubscribe_link', 'This unsubscribe link is not valid; change your mail choices on your account page.');
  }
  return user;
}

const stateOf = (user: User, kind: MailKind): UnsubscribeStateDto => ({
  kind,
  title: mailKindLabels[kind].title,
  on: !parseMailOff(user.mailOff).has(kind),
});

/** What the link would stop; changes nothing. */
export async function unsubscribeState(params: UnsubscribeParams): Promise<UnsubscribeStateDto> {
  return stateOf(await checkedUser(params), params.kind);
}

/** Turn this kind off (the one-click POST); doing it twice is harmless. */
export async function unsubscribe(params: UnsubscribeParams): Promise<UnsubscribeStateDto> {
  const user = await checkedUser(params);
  const off = parseMailOff(user.mailOff);
  off.add(params.kind);
  await user.update({ mailOff: formatMailOff(off) });
  return stateOf(user, params.kind);
}

export function choicesOf(user: Pick<User, 'mailOff'>): MailChoices {
  const off = parseMailOff(user.mailOff);
  return Object.fromEntries(MAIL_KINDS.map((k) => [k, !off.has(k)])) as MailChoices;
}

/** Apply choices from the account page (kinds not named keep their setting). */
export async function setChoices(actor: Actor, choices: Partial<MailChoices>, transaction?: Transaction): Promise<void> {
  const user = await User.findByPk(actor.id, { attributes: ['id', 'mailOff'], transaction });
  if (!user) throw new NotFoundError();
  const off = parseMailOff(user.mailOff);
  for (const [kind, on] of Object.entries(choices) as [MailKind, boolean][]) {
    if (on) off.delete(kind);
    else off.add(kind);
  }
  await user.update({ mailOff: formatMailOff(off) }, { transaction });
}
