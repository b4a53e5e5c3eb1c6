import { literal } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { MergePartInput } from '@shared/schemas/part.ts';
import { Part } from '../models/part.model.ts';
import { Actuator } from '../models/actuator.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Listing } from '../models/listing.model.ts';
import { PartPhoto } from '../models/part-photo.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError, ValidationError } from '../errors.ts';
import { recordAudit } from './audit.service.ts';
import { recomputePartStats } from './part-stats.service.ts';
import { invalidateRegistryCounts } from './registry-count-cache.ts';

/** Fold a duplicate part into another: actuators, runs, listings and photos move, both parts' statistics are recomputed, the trail records it. */
export async function mergeParts(actor: Actor | null, fromId: number, input: MergePartInput) {
  authorize(actor, 'review.access');
  if (fromId === input.intoPartId)
    throw new ValidationError('A part cannot be merged into itself.', [{ path: 'intoPartId', message: 'Pick another part.' }]);
  return withWriteTransaction(Part.sequelize!, async (transaction) => {
    const [from, into] = await Promise.all([
      Part.findByPk(fromId, { transaction, lock: transaction.LOCK.UPDATE }),
      Part.findByPk(input.intoPartId, { transaction, lock: transaction.LOCK.UPDATE }),
    ]);
    if (!from) throw new NotFoundError('No such part.');
    if (!into) throw new ValidationError('No such part to merge into.', [{ path: 'intoPartId', message: 'No such part.' }]);
    authorize(actor, 'review.decide', { authorIds: [from.proposedById, into.proposedById] });
    if (from.mergedIntoId !== null) throw new ConflictError('This part was already merged.', 'already_merged');
    if (into.mergedIntoId !== null || into.status !== 'accepted') throw new ConflictError('Merge into a listed part.', 'invalid_target');
    const moved = { partId: into.id };
    const where = { where: { partId: from.id }, transaction };
    const [actuators] = await Actuator.update(moved, where);
    const [runs] = await CalibrationRun.update(moved, where);
    const [listings] = await Listing.update(moved, where);
    // Photos follow, after the target's own (positions shifted past its last one).
    const lastInto = ((await PartPhoto.max('position', { where: { partId: into.id }, transaction })) as number | null) ?? -1;
    const [photos] = await PartPhoto.update(
      { partId: into.id, position: literal(`position + ${lastInto + 1}`) as unknown as number },
      where,
    );
    await from.update({ status: 'rejected', mergedIntoId: into.id }, { transaction });
    transaction.afterCommit(invalidateRegistryCounts);
    await recomputePartStats(from.id, transaction);
    await recomputePartStats(into.id, transaction);
    await recordAudit(
      actor,
      {
        action: 'part.merge',
        targetType: 'part',
        targetId: from.id,
        targetLabel: `${from.name} → ${into.name}`,
        note: `into part ${into.id}: ${input.note}`,
      },
      transaction,
    );
    return { id: from.id, mergedIntoId: into.id, moved: { actuators, runs, listings, photos } };
  });
}
