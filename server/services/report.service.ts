import type { Actor } from '@shared/policies.ts';
import type { CreateReportInput } from '@shared/schemas/review.ts';
import type { ReportTargetType } from '@shared/schemas/review-vocabulary.ts';
import { Report } from '../models/report.model.ts';
import { authorize } from '../policies/authorize.ts';
import { getRun } from './run.service.ts';
import { getPart } from './part.service.ts';
import { loadBuildForView } from './build-access.ts';
import { loadListingForView } from './listing-access.ts';
import { visibleComment } from './comment.service.ts';

/** Each kind of target must exist and be visible to the reporter (404 otherwise). */
const visibleTarget: Record<ReportTargetType, (actor: Actor, id: number) => Promise<unknown>> = {
  build: (actor, id) => loadBuildForView(actor, id),
  run: (actor, id) => getRun(actor, id),
  part: (actor, id) => getPart(actor, id),
  listing: (actor, id) => loadListingForView(actor, id),
  comment: (actor, id) => visibleComment(actor, id),
};

/** Anyone signed in may report something they can see; moderators work the report on the desk. */
export async function createReport(actor: Actor | null, input: CreateReportInput) {
  authorize(actor, 'content.create');
  await visibleTarget[input.targetType](actor, input.targetId);
  const report = await Report.create({
    reporterId: actor.id,
    targetType: input.targetType,
    targetId: input.targetId,
    reason: input.reason,
    note: input.note ?? null,
  });
  return { id: report.id, status: report.status, targetType: report.targetType, targetId: report.targetId, reason: report.reason };
}
