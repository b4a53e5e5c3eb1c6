// Every authorization rule of Scanwright, as pure functions. The server enforces them in one place
// (server/policies/authorize.ts); the client uses them only to hide controls it would refuse.

export const ROLES = ['maker', 'moderator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** The signed-in person as the rules see them; null for a visitor. */
export interface Actor {
  id: number;
  role: Role;
  suspended: boolean;
}

/** Whatever a rule needs to know about the thing acted on. */
export interface Resource {
  ownerId?: number | null;
  userId?: number;
  /** The other party of a two-sided resource (a message thread's enquirer). */
  participantId?: number;
  /**
   * Everyone whose work a decision judges: a build's, run's or listing's owner, a part's proposer, a report's
   * author and the owner of what it reports. Four eyes: none of them may make that decision.
   */
  authorIds?: ReadonlyArray<number | null>;
}

type Rule = (actor: Actor, resource?: Resource) => boolean;

const RANK: Record<Role, number> = { maker: 1, moderator: 2, admin: 3 };

/** At least this role (admins can do what moderators can, moderators what makers can). */
export const hasRole =
  (role: Role): Rule =>
  (actor) =>
    RANK[actor.role] >= RANK[role];
/** The actor owns the resource. */
export const isOwner: Rule = (actor, resource) => resource?.ownerId != null && resource.ownerId === actor.id;
/** The actor is the resource's other party. */
export const isParticipant: Rule = (actor, resource) => resource?.participantId != null && resource.participantId === actor.id;
/** The resource is the actor's own account. */
export const isSelf: Rule = (actor, resource) => resource?.userId === actor.id;
/** The actor's own work is among what a decision judges. */
export const isOwnWork: Rule = (actor, resource) => (resource?.authorIds ?? []).includes(actor.id);
export const and =
  (...rules: Rule[]): Rule =>
  (a, r) =>
    rules.every((rule) => rule(a, r));
export const or =
  (...rules: Rule[]): Rule =>
  (a, r) =>
    rules.some((rule) => rule(a, r));
export const not =
  (rule: Rule): Rule =>
  (a, r) =>
    !rule(a, r);
const active: Rule = (actor) => !actor.suspended;

const rules = {
  /** Anything a signed-in maker may write: builds, runs, listings, reports. */
  'content.create': and(active, hasRole('maker')),
  'account.update-settings': and(active, isSelf),
  /** One's own notifications and unread counts (a suspended maker may still read what they were told). */
  'notification.read': isSelf,
  /** Following builds, parts and makers: any active signed-in maker. */
  'follow.manage': and(active, hasRole('maker')),
  /** A build's review thread is between its owner and the moderators; both read it and write in it. */
  'review-thread.view': or(isOwner, hasRole('moderator')),
  'review-thread.post': and(active, or(isOwner, hasRole('moderator'))),
  /** Builds and everything inside them (entries, photos, actuators, runs) are edited by their owner only. */
  'build.edit': and(active, isOwner),
  /** Unpublished builds are visible to their owner and to moderators (who review them). */
  'build.view-unpublished': or(isOwner, hasRole('moderator')),
  /** The review desk's note on a build is for its owner and moderators, unless the moderator made a publish note public. */
  'build.view-review-note': or(isOwner, hasRole('moderator')),
  /** Parts not (yet) in the registry are visible to whoever proposed them and to moderators. */
  'part.view-unlisted': or(isOwner, hasRole('moderator')),
  /** A part's photos are kept by whoever proposed it and by moderators. */
  'part.photos': and(active, or(isOwner, hasRole('moderator'))),
  'review.access': and(active, hasRole('moderator')),
  /** Deciding a build, run, part or report: moderators, never on their own work (four eyes). */
  'review.decide': and(active, hasRole('moderator'), not(isOwnWork)),
  /** Listings are changed by their owner; moderators only hide them (with a note). */
  'listing.edit': and(active, isOwner),
  'listing.hide': and(active, hasRole('moderator'), not(isOwnWork)),
  'listing.view-hidden': or(isOwner, hasRole('moderator')),
  /** A comment on a published build is hidden by a moderator (with a note), not on their own comment or build. */
  'comment.hide': and(active, hasRole('moderator'), not(isOwnWork)),
  /** Anyone signed in may write to a listing's owner, except the owner themself. */
  'listing.message': and(active, not(isOwner)),
  /** A conversation about a listing is seen by its two parties only: the listing's owner and the maker who wrote first. */
  'message.thread.view': or(isOwner, isParticipant),
  'user.list': and(active, hasRole('admin')),
  /** Admins change others' roles, never their own (so the last admin cannot lock everyone out). */
  'user.set-role': and(active, hasRole('admin'), not(isSelf)),
  'user.suspend': and(active, hasRole('admin'), not(isSelf)),
  /** Admins see anyone's API tokens (names and dates, never secrets) and revoke one that leaked. */
  'user.tokens': and(active, hasRole('admin')),
  /** Mails the outbox gave up on: listed and re-queued by admins. */
  'outbox.manage': and(active, hasRole('admin')),
} satisfies Record<string, Rule>;

export type Action = keyof typeof rules;
/** Every action the rules know, so the policy test can prove it covers each one. */
export const ACTIONS = Object.keys(rules) as Action[];

/** Whether this actor may do this action on this resource; visitors may do none of the listed actions. */
export function can(actor: Actor | null | undefined, action: Action, resource?: Resource): boolean {
  if (!actor) return false;
  return rules[action](actor, resource);
}

/** Decisions under the four-eyes rule: refused on one's own work with a reason of their own. */
const FOUR_EYES: ReadonlySet<Action> = new Set<Action>(['review.decide', 'listing.hide']);

export interface Refusal {
  code: 'forbidden' | 'own_work';
  message: string;
}

/** Why a signed-in actor is refused (null when allowed), so the answer can say what to do instead. */
export function refusal(actor: Actor, action: Action, resource?: Resource): Refusal | null {
  if (can(actor, action, resource)) return null;
  if (FOUR_EYES.has(action) && !actor.suspended && hasRole('moderator')(actor) && isOwnWork(actor, resource)) {
    return { code: 'own_work', message: 'This is your own work: another moderator has to decide it.' };
  }
  return { code: 'forbidden', message: 'You are not allowed to do this.' };
}
