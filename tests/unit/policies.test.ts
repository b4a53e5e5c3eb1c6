import { describe, expect, test } from 'vitest';
import { can, type Action, type Actor, type Role } from '../../shared/policies.ts';

const actor = (role: Role, id = 1, suspended = false): Actor => ({ id, role, suspended });

// role × action × ownership; expected answers written out by hand from PRODUCT.md's role table.
const cases: Array<[string, Actor | null, Action, { ownerId?: number; userId?: number } | undefined, boolean]> = [
  ['visitor cannot create', null, 'content.create', undefined, false],
  ['maker creates', actor('maker'), 'content.create', undefined, true],
  ['suspended maker cannot create', actor('maker', 1, true), 'content.create', undefined, false],
  ['owner updates own', actor('maker', 1), 'content.update', { ownerId: 1 }, true],
  ['other maker cannot update', actor('maker', 2), 'content.update', { ownerId: 1 }, false],
  ['moderator updates others', actor('moderator', 2), 'content.update', { ownerId: 1 }, true],
  ['maker has no review desk', actor('maker'), 'review.access', undefined, false],
  ['moderator has the review desk', actor('moderator'), 'review.access', undefined, true],
  ['admin has the review desk', actor('admin'), 'review.access', undefined, true],
  ['moderator cannot list users', actor('moderator'), 'user.list', undefined, false],
  ['admin lists users', actor('admin'), 'user.list', undefined, true],
  ['admin sets another role', actor('admin', 1), 'user.set-role', { userId: 2 }, true],
  ['admin cannot set own role', actor('admin', 1), 'user.set-role', { userId: 1 }, false],
  ['admin suspends another', actor('admin', 1), 'user.suspend', { userId: 2 }, true],
  ['admin cannot suspend self', actor('admin', 1), 'user.suspend', { userId: 1 }, false],
  ['suspended admin can do nothing', actor('admin', 1, true), 'user.list', undefined, false],
  ['self updates settings', actor('maker', 3), 'account.update-settings', { userId: 3 }, true],
  ['other cannot update settings', actor('admin', 4), 'account.update-settings', { userId: 3 }, false],
];

describe('can()', () => {
  test.each(cases)('%s', (_name, who, action, resource, expected) => {
    expect(can(who, action, resource)).toBe(expected);
  });
});
