import type { MessageDto, ThreadDto, ThreadSummaryDto } from '@shared/schemas/listing.ts';
import type { Listing } from '../models/listing.model.ts';
import type { Message, MessageThread } from '../models/message.model.ts';

/** How much of the newest message an inbox row shows. */
const PREVIEW_CHARS = 200;

/**
 * One conversation as one of its two parties sees it: the other party by login only (never an
 * address), the newest message's start, and how many of the other party's messages wait unread.
 */
export function presentThreadSummary(
  thread: MessageThread,
  viewerId: number,
  about: { listing: Listing; partName: string; otherLogin: string; newestFirst: Message[] },
): ThreadSummaryDto {
  const { listing, newestFirst } = about;
  const viewerOwns = thread.ownerId === viewerId;
  return {
    id: thread.id,
    listing: { id: listing.id, kind: listing.kind, partName: about.partName, status: listing.status },
    other: { id: viewerOwns ? thread.starterId : thread.ownerId, login: about.otherLogin },
    role: viewerOwns ? 'owner' : 'enquirer',
    lastMessageAt: thread.lastMessageAt.toISOString(),
    lastMessage: newestFirst[0]?.body.slice(0, PREVIEW_CHARS) ?? '',
    unread: newestFirst.filter((m) => m.senderId !== viewerId && m.readAt === null).length,
  };
}

/** One message in a conversation; the sender by login, `fromMe` so the page can place it. */
function presentMessage(m: Message, viewerId: number, senderLogin: string): MessageDto {
  return { id: m.id, fromMe: m.senderId === viewerId, sender: senderLogin, body: m.body, createdAt: m.createdAt.toISOString() };
}

/** A whole conversation: its inbox row and every message, oldest first, senders by login. */
export function presentThread(summary: ThreadSummaryDto, oldestFirst: Message[], viewerId: number, logins: Map<number, string>): ThreadDto {
  return { ...summary, messages: oldestFirst.map((m) => presentMessage(m, viewerId, logins.get(m.senderId) ?? 'unknown')) };
}
