import { Op, type Transaction } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import { can, type Actor } from '@shared/policies.ts';
import type { SendMessageInput, ThreadDto, ThreadSummaryDto } from '@shared/schemas/listing.ts';
import { Listing } from '../models/listing.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { Message, MessageThread } from '../models/message.model.ts';
import { authorize } from '../policies/authorize.ts';
import { presentThread, presentThreadSummary } from '../presenters/message.presenter.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { loadListingForView } from './listing-access.ts';
import { enqueueMail, kickOutbox } from './outbox.service.ts';
import { noticeMail } from './review-mails.ts';

/** Mail the other party that a message waits on the site; the text never carries anyone's address. */
async function notify(
  recipientId: number,
  senderLogin: string,
  listingTitle: string,
  body: string,
  threadId: number,
  transaction: Transaction,
) {
  const recipient = await User.findByPk(recipientId, { transaction, attributes: ['id', 'login', 'email', 'mailOptOut'] });
  if (!recipient) return;
  const excerpt = body.length > 600 ? `${body.slice(0, 600)}…` : body;
  await enqueueMail(
    recipient,
    noticeMail({
      subject: `Message from ${senderLogin} about ${listingTitle}`,
      greeting: recipient.login,
      lines: [`${senderLogin} wrote about ${listingTitle}:`, excerpt, 'Reply on Scanwright; your e-mail address is not shown to them.'],
      note: null,
      path: `/inbox/${threadId}`,
      linkText: 'Read and reply',
    }),
    { essential: true, kind: 'messages', transaction },
  );
}

async function listingTitle(listing: Listing): Promise<string> {
  const part = await Part.findByPk(listing.partId, { attributes: ['name'] });
  return `your ${listing.kind === 'offering' ? 'offer' : 'request'}: ${listing.quantity} × ${part?.name ?? 'part'}`;
}

/**
 * The enquirer's thread on a listing, made on the first message, its lastMessageAt bumped and the
 * row locked for this transaction. ON DUPLICATE KEY locks an existing row exclusively, so messages
 * sent at the same moment queue up instead of failing on the unique key or deadlocking.
 */
async function lockThread(listing: Listing, starterId: number, transaction: Transaction): Promise<MessageThread> {
  const where = { listingId: listing.id, starterId };
  await MessageThread.bulkCreate([{ ...where, ownerId: listing.ownerId, lastMessageAt: new Date() }], {
    updateOnDuplicate: ['lastMessageAt'],
    transaction,
  });
  return (await MessageThread.findOne({ where, transaction, lock: transaction.LOCK.UPDATE }))!;
}

/** A closed or hidden listing takes no new messages, in a new conversation or an existing one (409). */
function assertOpenForMessages(listing: Listing | null): asserts listing is Listing {
  if (!listing || listing.status === 'closed')
    throw new ConflictError('This listing is closed; it takes no new messages.', 'listing_closed');
  if (listing.hiddenAt) throw new ConflictError('A moderator hid this listing; it takes no new messages.', 'listing_hidden');
}

/** Write to a listing's owner through the site: one thread per listing and enquirer. */
export async function sendListingMessage(
  actor: Actor | null,
  listingId: number,
  input: SendMessageInput,
): Promise<{ threadId: number; messageId: number }> {
  const listing = await loadListingForView(actor, listingId);
  authorize(actor, 'listing.message', { ownerId: listing.ownerId });
  assertOpenForMessages(listing);
  const title = await listingTitle(listing);
  const me = await User.findByPk(actor.id, { attributes: ['login'] });
  const result = await withWriteTransaction(Listing.sequelize!, async (transaction) => {
    const thread = await lockThread(listing, actor.id, transaction);
    const message = await Message.create({ threadId: thread.id, senderId: actor.id, body: input.body }, { transaction });
    await notify(listing.ownerId, me?.login ?? 'A maker', title, input.body, thread.id, transaction);
    return { threadId: thread.id, messageId: message.id };
  });
  kickOutbox();
  return result;
}

/** A conversation of the actor's; to anyone else it does not exist (404, so thread ids reveal nothing). */
async function loadThread(actor: Actor | null, threadId: number): Promise<MessageThread> {
  authorize(actor, 'content.create');
  const thread = await MessageThread.findByPk(threadId);
  if (!thread || !can(actor, 'message.thread.view', { ownerId: thread.ownerId, participantId: thread.starterId }))
    throw new NotFoundError('No such conversation.');
  return thread;
}

async function summarize(actor: Actor, threads: MessageThread[]): Promise<ThreadSummaryDto[]> {
  if (threads.length === 0) return [];
  const ids = threads.map((t) => t.id);
  const [listings, users, messages] = await Promise.all([
    Listing.findAll({ where: { id: [...new Set(threads.map((t) => t.listingId))] } }),
    User.findAll({ where: { id: [...new Set(threads.flatMap((t) => [t.ownerId, t.starterId]))] }, attributes: ['id', 'login'] }),
    Message.findAll({
      where: { threadId: ids },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
  ]);
  const parts = new Map(
    (await Part.findAll({ where: { id: [...new Set(listings.map((l) => l.partId))] }, attributes: ['id', 'name'] })).map((p) => [
      p.id,
      p.name,
    ]),
  );
  const listingMap = new Map(listings.map((l) => [l.id, l]));
  const userMap = new Map(users.map((u) => [u.id, u.login]));
  return threads.map((t) => {
    const listing = listingMap.get(t.listingId)!;
    const otherId = t.ownerId === actor.id ? t.starterId : t.ownerId;
    return presentThreadSummary(t, actor.id, {
      listing,
      partName: parts.get(listing.partId) ?? '',
      otherLogin: userMap.get(otherId) ?? 'unknown',
      newestFirst: messages.filter((m) => m.threadId === t.id),
    });
  });
}

/** The signed-in maker's conversations, most recent first. */
export async function listThreads(actor: Actor | null): Promise<ThreadSummaryDto[]> {
  authorize(actor, 'content.create');
  const threads = await MessageThread.findAll({
    where: { [Op.or]: [{ ownerId: actor.id }, { starterId: actor.id }] },
    order: [['lastMessageAt', 'DESC']],
    limit: 200,
  });
  return summarize(actor, threads);
}

/** One conversation, read without changing anything (a GET must be safe: an image link could otherwise mark it read). */
export async function getThread(actor: Actor | null, threadId: number): Promise<ThreadDto> {
  const thread = await loadThread(actor, threadId);
  const [summary] = await summarize(actor!, [thread]);
  const messages = await Message.findAll({
    where: { threadId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const logins = new Map(
    (await User.findAll({ where: { id: [thread.ownerId, thread.starterId] }, attributes: ['id', 'login'] })).map((u) => [u.id, u.login]),
  );
  return presentThread(summary!, messages, actor!.id, logins);
}

/** The reader marks the other party's messages in a conversation read (the client does so when it shows the thread). */
export async function markThreadRead(actor: Actor | null, threadId: number): Promise<void> {
  await loadThread(actor, threadId);
  await Message.update({ readAt: new Date() }, { where: { threadId, senderId: { [Op.ne]: actor!.id }, readAt: null } });
}

/** Reply inside a conversation; the other party gets a mail with a link, never an address. */
export async function replyInThread(
  actor: Actor | null,
  threadId: number,
  input: SendMessageInput,
): Promise<{ threadId: number; messageId: number }> {
  const thread = await loadThread(actor, threadId);
  const listing = await Listing.findByPk(thread.listingId);
  assertOpenForMessages(listing);
  const me = await User.findByPk(actor!.id, { attributes: ['login'] });
  const otherId = thread.ownerId === actor!.id ? thread.starterId : thread.ownerId;
  const title = thread.ownerId === actor!.id ? `their enquiry` : await listingTitle(listing);
  const result = await withWriteTransaction(Listing.sequelize!, async (transaction) => {
    // The thread row first: the message's foreign key would otherwise take a shared lock on it that
    // two replies at once both try to upgrade (a deadlock).
    await thread.update({ lastMessageAt: new Date() }, { transaction });
    const message = await Message.create({ threadId, senderId: actor!.id, body: input.body }, { transaction });
    await notify(otherId, me?.login ?? 'A maker', title, input.body, threadId, transaction);
    return { threadId, messageId: message.id };
  });
  kickOutbox();
  return result;
}
