import { partStatsOf } from '@shared/schemas/part.ts';
// The whole-registry dataset (open data): listed parts, accepted runs of published builds and their raw
// records. Public and actor-independent. Raw records are read in batches and streamed, never all at once.
import { once } from 'node:events';
import type { Writable } from 'node:stream';
import { Op, literal, type WhereOptions } from 'sequelize';
import {
  PART_COLUMNS,
  RUN_COLUMNS,
  csvText,
  datasetJson,
  datasetReadme,
  partRow,
  pointsHeader,
  pointsRows,
  runRow,
  type DatasetPart,
} from '@shared/export/registry-dataset.ts';
import { RUN_KINDS } from '@shared/schemas/run-vocabulary.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Build } from '../models/build.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { presentRun, RUN_READ_COLUMNS } from '../presenters/run.presenter.ts';
import { IN_PUBLISHED_BUILD } from './part-stats.service.ts';

/** Points or samples read per batch for points.csv (a run is never split). */
const POINTS_PER_BATCH = 200_000;
/** Runs read per batch at most. */
const RUNS_PER_BATCH = 100;

/** Accepted runs of listed parts in published builds: the only runs the dataset holds. */
const PUBLIC_RUNS: WhereOptions<CalibrationRun> = {
  status: 'accepted',
  [Op.and]: [literal(IN_PUBLISHED_BUILD), literal(`part_id IN (SELECT p.id FROM parts p WHERE p.status = 'accepted')`)],
};

/** Every column a presenter reads except the plot series, which files never need. */
const FIGURE_COLUMNS = RUN_READ_COLUMNS.filter((c) => c !== 'plotJson');

const originOf = (publicUrl: string) => publicUrl.replace(/\/$/, '');

async function listedParts(): Promise<DatasetPart[]> {
  const parts = await Part.findAll({ where: { status: 'accepted' }, order: [['id', 'ASC']] });
  return parts.map((p) => ({
    id: p.id,
    name: p.name,
    category: p.category,
    salvageSource: p.salvageSource,
    material: p.material,
    lengthMm: p.lengthMm,
    widthMm: p.widthMm,
    thicknessMm: p.thicknessMm,
    outerDiameterMm: p.outerDiameterMm,
    wallMm: p.wallMm,
    layers: p.layers,
    capacitanceNf: p.capacitanceNf,
    safeVolts: p.safeVolts,
    stats: partStatsOf(p),
  }));
}

/** parts.csv rows. */
async function partRows(origin: string): Promise<string[][]> {
  return (await listedParts()).map((p) => partRow(p, origin));
}

/** runs.csv rows: each accepted run with its part, build and maker. */
async function runRows(origin: string): Promise<string[][]> {
  const runs = await CalibrationRun.findAll({ where: PUBLIC_RUNS, attributes: [...FIGURE_COLUMNS], order: [['id', 'ASC']] });
  const buildIds = [...new Set(runs.map((r) => r.buildId))];
  const partIds = [...new Set(runs.map((r) => r.partId))];
  const [builds, parts] = await Promise.all([
    Build.findAll({ where: { id: buildIds }, attributes: ['id', 'title', 'ownerId'] }),
    Part.findAll({ where: { id: partIds }, attributes: ['id', 'name'] }),
  ]);
  const owners = await User.findAll({ where: { id: [...new Set(builds.map((b) => b.ownerId))] }, attributes: ['id', 'login'] });
  const build = new Map(builds.map((b) => [b.id, b]));
  const part = new Map(parts.map((p) => [p.id, p.name]));
  const login = new Map(owners.map((u) => [u.id, u.login]));
  return runs.map((r) => {
    const b = build.get(r.buildId);
    return runRow(
      presentRun(r),
      {
        partId: r.partId,
        partName: part.get(r.partId) ?? '',
        buildId: r.buildId,
        buildTitle: b?.title ?? '',
        maker: (b && login.get(b.ownerId)) ?? '',
      },
      origin,
    );
  });
}

export async function datasetReadmeText(publicUrl: string): Promise<string> {
  return datasetReadme(originOf(publicUrl), new Date().toISOString());
}

export async function datasetPartsCsv(publicUrl: string): Promise<string> {
  return csvText(PART_COLUMNS, await partRows(originOf(publicUrl)));
}

export async function datasetRunsCsv(publicUrl: string): Promise<string> {
  return csvText(RUN_COLUMNS, await runRows(originOf(publicUrl)));
}

export async function datasetJsonBody(publicUrl: string) {
  const origin = originOf(publicUrl);
  const [parts, runs] = await Promise.all([partRows(origin), runRows(origin)]);
  return datasetJson(parts, runs, new Date().toISOString(), origin);
}

/** Write and wait while the socket's buffer is full, so a slow client does not make us hold the file in memory. */
async function writeChunk(out: Writable, chunk: string): Promise<void> {
  if (chunk && !out.write(chunk)) await once(out, 'drain');
}

/** Batches of run ids holding at most POINTS_PER_BATCH points (one bigger run alone) and RUNS_PER_BATCH runs. */
function batchesOf(runs: ReadonlyArray<{ id: number; pointCount: number }>): number[][] {
  const batches: number[][] = [];
  let current: number[] = [];
  let points = 0;
  for (const r of runs) {
    if (current.length > 0 && (points + r.pointCount > POINTS_PER_BATCH || current.length >= RUNS_PER_BATCH)) {
      batches.push(current);
      current = [];
      points = 0;
    }
    current.push(r.id);
    points += r.pointCount;
  }
  if (current.length > 0) batches.push(current);
  return batches;
}

/** points.csv: every accepted run's raw record in long format, streamed batch by batch. */
export async function streamDatasetPoints(out: Writable): Promise<void> {
  const runs = await CalibrationRun.findAll({
    where: PUBLIC_RUNS,
    attributes: ['id', 'pointCount', 'kind', 'voltageUnit', 'displacementUnit'],
    order: [['id', 'ASC']],
  });
  const shapes = runs.map((r) => ({ kind: r.kind, voltageUnit: r.voltageUnit, displacementUnit: r.displacementUnit }));
  const combos = [...new Map(shapes.map((c) => [`${c.kind} ${c.voltageUnit} ${c.displacementUnit}`, c])).values()].sort(
    (a, b) => RUN_KINDS.indexOf(a.kind) - RUN_KINDS.indexOf(b.kind),
  );
  const header = pointsHeader(combos.length > 0 ? combos : [{ kind: 'points', voltageUnit: 'V', displacementUnit: 'nm' }]);
  await writeChunk(out, csvText(header, []));
  for (const ids of batchesOf(runs)) {
    const batch = await CalibrationRun.findAll({
      where: { id: ids },
      attributes: [...FIGURE_COLUMNS, 'pointsJson'],
      order: [['id', 'ASC']],
    });
    for (const r of batch) {
      const rows = pointsRows(presentRun(r), JSON.parse(r.pointsJson) as unknown[], header);
      await writeChunk(out, csvText(header, rows, false));
    }
  }
}
