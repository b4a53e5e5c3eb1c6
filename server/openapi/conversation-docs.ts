// Route table rows (route-docs.ts): review threads, follows, notifications and mail choices.
import { buildIdParams } from '@shared/schemas/build.ts';
import { createReviewPostInput } from '@shared/schemas/review-thread.ts';
import { followParams } from '@shared/schemas/follow.ts';
import { markNotificationsReadInput, notificationsQuery } from '@shared/schemas/notification.ts';
import { unsubscribeParams } from '@shared/schemas/mail-choices.ts';
import { json, noContent, type RouteDoc } from './route-doc.ts';

export const conversationDocs: RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/builds/:buildId/review-thread',
    summary: 'A build’s review thread: posts of its maker and the moderators, with the desk’s decisions in between',
    description: 'Only the build’s maker and moderators read it; anyone else gets 404.',
    tag: 'Review threads',
    auth: 'session',
    params: buildIdParams,
    response: json(200, '`{ buildId, items: [...], abilities: { post } }`, oldest first.'),
  },
  {
    method: 'POST',
    path: '/api/builds/:buildId/review-thread',
    summary: 'Write in a build’s review thread (its maker or a moderator); the other side is notified and mailed',
    description: 'At most 20 posts per 10 minutes per person (429).',
    tag: 'Review threads',
    auth: 'session',
    params: buildIdParams,
    body: createReviewPostInput,
    response: json(201, 'The post.'),
    errors: [429],
    example: { body: 'The bar is now clamped at 3 mm from the end; the new runs are on the editor.' },
  },
  {
    method: 'GET',
    path: '/api/follows/mine',
    summary: 'What I follow, newest first',
    tag: 'Follows and notifications',
    auth: 'session',
    response: json(200, '`{ items: [{ targetType, targetId, label, path, since }] }`.'),
  },
  {
    method: 'GET',
    path: '/api/follows/:targetType/:targetId',
    summary: 'Whether I follow a build, part or maker, and how many people do',
    tag: 'Follows and notifications',
    auth: 'visitor',
    params: followParams,
    response: json(200, '`{ targetType, targetId, following, followers }`.'),
  },
  {
    method: 'PUT',
    path: '/api/follows/:targetType/:targetId',
    summary: 'Follow a published build (new log entries), a registry part (newly counted runs) or a maker (new builds)',
    description: 'Following twice is the same as once. Yourself: 400 `follow_self`; more than 500 follows: 409 `too_many_follows`.',
    tag: 'Follows and notifications',
    auth: 'session',
    params: followParams,
    response: json(200, 'The follow state.'),
    errors: [409],
  },
  {
    method: 'DELETE',
    path: '/api/follows/:targetType/:targetId',
    summary: 'Stop following',
    tag: 'Follows and notifications',
    auth: 'session',
    params: followParams,
    response: noContent('Not followed any more (also when it was not).'),
  },
  {
    method: 'GET',
    path: '/api/notifications',
    summary: 'My notifications, newest first, with the unread count',
    tag: 'Follows and notifications',
    auth: 'session',
    query: notificationsQuery,
    response: json(200, '`{ items, unread, nextBefore }`; pass `nextBefore` as `before` for the next page.'),
  },
  {
    method: 'GET',
    path: '/api/notifications/counts',
    summary: 'Unread notifications and unread exchange messages (the navigation’s badges)',
    tag: 'Follows and notifications',
    auth: 'session',
    response: json(200, '`{ notifications, messages }`.'),
  },
  {
    method: 'POST',
    path: '/api/notifications/read',
    summary: 'Mark notifications read: the ids given, or all without ids',
    tag: 'Follows and notifications',
    auth: 'session',
    body: markNotificationsReadInput,
    response: json(200, '`{ unread }`, the unread count after.'),
    example: { ids: [12, 13] },
  },
  {
    method: 'GET',
    path: '/api/mail/unsubscribe/:userId/:kind/:token',
    summary: 'What a mail’s unsubscribe link would stop (changes nothing)',
    description: 'The signed link is the credential; no session. A wrong or old link: 404 `bad_unsubscribe_link`.',
    tag: 'Follows and notifications',
    auth: 'visitor',
    params: unsubscribeParams,
    response: json(200, '`{ kind, title, on }`.'),
  },
  {
    method: 'POST',
    path: '/api/mail/unsubscribe/:userId/:kind/:token',
    summary: 'One-click unsubscribe from one kind of mail (RFC 8058 List-Unsubscribe-Post)',
    description:
      'The address in each mail’s List-Unsubscribe header. Needs no session, CSRF token or Origin; the body ' +
      '(`List-Unsubscribe=One-Click`) is not read. Doing it twice is harmless.',
    tag: 'Follows and notifications',
    auth: 'visitor',
    params: unsubscribeParams,
    response: json(200, '`{ kind, title, on: false }`.'),
  },
];
