// The combined decision on a build: publish it and accept every pending run that carries no
// plausibility flag; a flagged run stays pending for a moderator to look at on its own.
import type { PublishWithRunsPlan } from '../schemas/review-desk.ts';
import type { PlausibilityFlag } from './plausibility.ts';

/** The plan for a build's pending runs, in the order given. */
export function publishWithRunsPlan(runs: ReadonlyArray<{ id: number; flags: readonly PlausibilityFlag[] }>): PublishWithRunsPlan {
  return {
    accept: runs.filter((r) => r.flags.length === 0).map((r) => r.id),
    stayPending: runs.filter((r) => r.flags.length > 0).map((r) => ({ id: r.id, flags: r.flags.map((f) => f.code) })),
  };
}

/** Whether the runs a preview listed are exactly the runs the plan accepts now. */
export function samePlan(plan: PublishWithRunsPlan, acceptRunIds: readonly number[]): boolean {
  const a = [...plan.accept].sort((x, y) => x - y);
  const b = [...new Set(acceptRunIds)].sort((x, y) => x - y);
  return a.length === b.length && a.every((id, i) => id === b[i]);
}
