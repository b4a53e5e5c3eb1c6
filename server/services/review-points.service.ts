import type { Actor } from '@shared/policies.ts';
import type { RunPointsPageDto, RunPointsQuery } from '@shared/schemas/review-desk.ts';
import { recordTable } from '@shared/export/run-export.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { presentRun } from '../presenters/run.presenter.ts';
import { authorize } from '../policies/authorize.ts';
import { AppError, NotFoundError } from '../errors.ts';

/**
 * One page of a run's raw record for the review desk (moderators, any status of run or build), in the
 * export's columns and the run's own units. A page past the last is 404 page_out_of_range; page 1 of an
 * empty record is an empty page.
 */
export async function getRunPointsPage(actor: Actor | null, runId: number, q: RunPointsQuery): Promise<RunPointsPageDto> {
  authorize(actor, 'review.access');
  const run = await CalibrationRun.findByPk(runId);
  if (!run) throw new NotFoundError('No such calibration run.');
  const { header, rows } = recordTable(presentRun(run), JSON.parse(run.pointsJson) as unknown[]);
  const pages = Math.max(1, Math.ceil(rows.length / q.pageSize));
  if (q.page > pages) {
    throw new AppError(
      404,
      'page_out_of_range',
      `This run has ${rows.length} rows: ${pages} page${pages === 1 ? '' : 's'} of ${q.pageSize}.`,
    );
  }
  const start = (q.page - 1) * q.pageSize;
  return {
    runId: run.id,
    kind: run.kind,
    columns: header,
    rows: rows.slice(start, start + q.pageSize),
    total: rows.length,
    page: q.page,
    pageSize: q.pageSize,
  };
}
