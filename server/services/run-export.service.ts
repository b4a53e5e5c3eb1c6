import type { Actor } from '@shared/policies.ts';
import { runCsv, runJson, type RunSource } from '@shared/export/run-export.ts';
import { Build } from '../models/build.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { getRunRecord } from './run.service.ts';

/** A run's raw record as CSV or JSON, for anyone who may see the run. */
export async function exportRun(
  actor: Actor | null,
  runId: number,
  format: 'csv' | 'json',
  publicUrl: string,
): Promise<{ filename: string; contentType: string; body: string }> {
  const { run, record } = await getRunRecord(actor, runId);
  const [build, part] = await Promise.all([
    Build.findByPk(run.buildId, { attributes: ['id', 'title', 'ownerId'] }),
    Part.findByPk(run.partId, { attributes: ['id', 'name'] }),
  ]);
  const owner = build ? await User.findByPk(build.ownerId, { attributes: ['id', 'login'] }) : null;
  const source: RunSource = {
    buildId: run.buildId,
    buildTitle: build?.title ?? '',
    partName: part?.name ?? '',
    maker: owner?.login ?? 'unknown',
    url: `${publicUrl.replace(/\/$/, '')}/builds/${run.buildId}#run-${run.id}`,
  };
  const filename = `scanwright-run-${run.id}.${format}`;
  if (format === 'json')
    return { filename, contentType: 'application/json; charset=utf-8', body: JSON.stringify(runJson(run, record, source)) };
  return { filename, contentType: 'text/csv; charset=utf-8', body: runCsv(run, record, source) };
}
