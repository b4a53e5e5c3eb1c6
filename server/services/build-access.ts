import type { Transaction } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import { Build } from '../models/build.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';

const notFound = () => new NotFoundError('No such build.');

/** A build the actor may read: published ones for everyone; others only for owner and moderators (404 otherwise, so drafts stay invisible). */
export async function loadBuildForView(actor: Actor | null, buildId: number): Promise<Build> {
  const build = await Build.findByPk(buildId);
  if (!build) throw notFound();
  if (build.status !== 'published' && !can(actor, 'build.view-unpublished', { ownerId: build.ownerId })) throw notFound();
  return build;
}

/**
 * A build the actor may change: 401 for visitors, 404 when they cannot even see it, 403 when they
 * can see it but it is not theirs. Pass a transaction to lock the row for the change.
 */
export async function loadBuildForEdit(
  actor: Actor | null,
  buildId: number,
  transaction?: Transaction,
  opts: { anyState?: boolean } = {},
): Promise<Build> {
  authorize(actor, 'content.create');
  const build = await Build.findByPk(buildId, transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {});
  if (!build) throw notFound();
  if (build.status !== 'published' && !can(actor, 'build.view-unpublished', { ownerId: build.ownerId })) throw notFound();
  authorize(actor, 'build.edit', { ownerId: build.ownerId });
  if (!opts.anyState) assertEditable(build);
  return build;
}

/** Builds under review (submitted) or declined are frozen; drafts, returned and published builds can change. */
export function assertEditable(build: Build): void {
  if (build.status === 'submitted')
    throw new ConflictError('This build is pending review; it can be edited again once a moderator has looked at it.', 'build_locked');
  if (build.status === 'declined') throw new ConflictError('This build was declined and can no longer be edited.', 'build_locked');
}

/** After the owner changes a published build: it stays live and is flagged for the review desk. */
export async function markEdited(build: Build, transaction?: Transaction): Promise<void> {
  if (build.status === 'published' && !build.editedSinceReview) await build.update({ editedSinceReview: true }, { transaction });
}
