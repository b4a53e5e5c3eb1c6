import { describe, expect, test } from 'vitest';
import { can } from '../../shared/policies.ts';
import { DEMO_ACCOUNTS } from '../../server/dev/demo-accounts.ts';
import { DEMO_PARTS } from '../../server/db/seed/demo-parts.ts';
import { DEMO_BUILDS } from '../../server/db/seed/demo-builds.ts';
import { DEMO_LISTINGS } from '../../server/db/seed/demo-listings.ts';

// Four eyes in the demo: every seeded build, run, part and listing has a moderator or admin among the demo
// accounts who is not its owner and so may decide it.
const ids = new Map<string, number>(DEMO_ACCOUNTS.map((a, i) => [a.login, i + 1]));
const actors = DEMO_ACCOUNTS.map((a) => ({ login: a.login, actor: { id: ids.get(a.login)!, role: a.role, suspended: false } }));

const items = [
  ...DEMO_BUILDS.flatMap((b) => [
    [`build "${b.title}"`, b.owner] as const,
    ...b.actuators.flatMap((a) => a.runs.map((_, i) => [`run ${i + 1} of ${a.label ?? a.axis} in "${b.title}"`, b.owner] as const)),
  ]),
  ...DEMO_PARTS.map((p) => [`part "${p.name}"`, p.proposedBy] as const),
  ...DEMO_LISTINGS.map((l) => [`listing of ${l.part} by ${l.owner}`, l.owner] as const),
];

describe('demo seed under the four-eyes rule', () => {
  test.each(items)('when %s is decided, then at least two demo accounts other than its owner may decide it', (_what, owner) => {
    const deciders = actors.filter(({ actor }) => can(actor, 'review.decide', { authorIds: [ids.get(owner)!] }));
    expect(deciders.map((d) => d.login)).not.toContain(owner);
    expect(deciders.length).toBeGreaterThanOrEqual(2);
  });

  test('when the demo accounts are counted, then there are at least two moderators besides the admin', () => {
    expect(DEMO_ACCOUNTS.filter((a) => a.role === 'moderator').length).toBeGreaterThanOrEqual(2);
  });
});
