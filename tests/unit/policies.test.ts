import { describe, expect, test } from 'vitest';
import { ACTIONS, can, refusal, type Action, type Actor, type Resource } from '../../shared/policies.ts';

// Every action × every kind of actor, answers written out by hand from PRODUCT.md's role table and
// the rule comments in shared/policies.ts. Columns: visitor, maker who owns it (and is the account),
// another maker, the owner suspended, a moderator (not owner), an admin (not owner, not the account).
type Row = [visitor: boolean, owner: boolean, otherMaker: boolean, suspendedOwner: boolean, moderator: boolean, admin: boolean];

const table: Record<Action, Row> = {
  'content.create': [false, true, true, false, true, true],
  'account.update-settings': [false, true, false, false, false, false],
  'notification.read': [false, true, false, true, false, false],
  'follow.manage': [false, true, true, false, true, true],
  'review-thread.view': [false, true, false, true, true, true],
  'review-thread.post': [false, true, false, false, true, true],
  'build.edit': [false, true, false, false, false, false],
  'build.view-unpublished': [false, true, false, true, true, true],
  'build.view-review-note': [false, true, false, true, true, true],
  'part.view-unlisted': [false, true, false, true, true, true],
  'part.photos': [false, true, false, false, true, true],
  'review.access': [false, false, false, false, true, true],
  'review.decide': [false, false, false, false, true, true],
  'listing.edit': [false, true, false, false, false, false],
  'listing.hide': [false, false, false, false, true, true],
  'comment.hide': [false, false, false, false, true, true],
  'listing.view-hidden': [false, true, false, true, true, true],
  'listing.message': [false, false, true, false, true, true],
  'message.thread.view': [false, true, false, true, false, false],
  'user.list': [false, false, false, false, false, true],
  'user.set-role': [false, false, false, false, false, true],
  'user.suspend': [false, false, false, false, false, true],
  'user.tokens': [false, false, false, false, false, true],
  'outbox.manage': [false, false, false, false, false, true],
};

const OWNER = 1;
const resource: Resource = { ownerId: OWNER, userId: OWNER };
const actors: Array<[string, Actor | null]> = [
  ['a visitor', null],
  ['the owner (a maker)', { id: OWNER, role: 'maker', suspended: false }],
  ['another maker', { id: 2, role: 'maker', suspended: false }],
  ['the owner, suspended', { id: OWNER, role: 'maker', suspended: true }],
  ['a moderator', { id: 3, role: 'moderator', suspended: false }],
  ['an admin', { id: 4, role: 'admin', suspended: false }],
];

describe('can()', () => {
  test('when the table is read, then it has a row for every action the rules know, and no other', () => {
    expect(Object.keys(table).sort()).toEqual([...ACTIONS].sort());
  });

  const cases = ACTIONS.flatMap((action) => actors.map(([who, actor], i) => [action, who, actor, table[action][i]] as const));
  test.each(cases)('when %s is asked for %s, then the answer follows the table', (action, _who, actor, expected) => {
    expect(can(actor, action, resource)).toBe(expected);
  });

  test('when admins act on their own account, then they cannot change their own role or suspend themselves', () => {
    const admin: Actor = { id: 9, role: 'admin', suspended: false };
    expect(can(admin, 'user.set-role', { userId: 9 })).toBe(false);
    expect(can(admin, 'user.suspend', { userId: 9 })).toBe(false);
    expect(can(admin, 'user.set-role', { userId: 10 })).toBe(true);
  });

  test('when the maker who started a thread asks to see it, then they may; a third maker may not', () => {
    const starter: Actor = { id: 5, role: 'maker', suspended: false };
    expect(can(starter, 'message.thread.view', { ownerId: OWNER, participantId: 5 })).toBe(true);
    expect(can({ ...starter, id: 6 }, 'message.thread.view', { ownerId: OWNER, participantId: 5 })).toBe(false);
  });

  test('when moderators or admins decide on their own work, then they may not, and the refusal says why', () => {
    const moderator: Actor = { id: 3, role: 'moderator', suspended: false };
    const admin: Actor = { id: 4, role: 'admin', suspended: false };
    for (const action of ['review.decide', 'listing.hide'] as const) {
      for (const actor of [moderator, admin]) {
        expect(can(actor, action, { authorIds: [actor.id] })).toBe(false);
        expect(can(actor, action, { authorIds: [null, 99, actor.id] })).toBe(false);
        expect(refusal(actor, action, { authorIds: [actor.id] })?.code).toBe('own_work');
        expect(can(actor, action, { authorIds: [99, null] })).toBe(true);
        expect(refusal(actor, action, { authorIds: [99] })).toBeNull();
      }
      // A maker is refused for being a maker, not for the work being theirs.
      expect(refusal({ id: 5, role: 'maker', suspended: false }, action, { authorIds: [5] })?.code).toBe('forbidden');
    }
  });

  test('when a resource has no owner, then nobody owns it', () => {
    const maker: Actor = { id: 1, role: 'maker', suspended: false };
    expect(can(maker, 'build.edit', { ownerId: null })).toBe(false);
    expect(can(maker, 'build.edit', {})).toBe(false);
  });
});
