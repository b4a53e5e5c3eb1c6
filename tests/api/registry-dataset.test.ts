// The whole-registry dataset: only accepted runs of listed parts in published builds, each file's columns,
// figures rounded exactly as the run's and the part's pages print them, the licence, and CSV that parses.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import Papa from 'papaparse';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { runColumns } from '../../server/services/run.service.ts';
import { recomputePartStats } from '../../server/services/part-stats.service.ts';
import { fitRun } from '../../shared/workbench/run-fit.ts';
import { runPrintedFigures, RUN_FIGURE_COLUMNS } from '../../shared/export/run-figures.ts';
import { formatShort, plainFigure } from '../../shared/format/measured-number.ts';
import { PART_COLUMNS, RUN_COLUMNS } from '../../shared/export/registry-dataset.ts';
import { DATA_LICENCE } from '../../shared/data-licence.ts';
import type { RunDto } from '../../shared/schemas/run.ts';

const BASE = '/api/registry/dataset';
let t: TestApp;
const ids = {} as {
  listed: number;
  proposed: number;
  accepted: number;
  p2p: number;
  pending: number;
  rejected: number;
  inDraft: number;
  ofProposed: number;
  maker: string;
};

const csv = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

beforeAll(async () => {
  t = await startTestApp();
  const owner = await createUser();
  ids.maker = owner.login;
  const listed = await createPart({ name: '=Formula bar' });
  const proposed = await createPart({ status: 'proposed' });
  const published = await createBuildRow(owner.id, { status: 'published', title: 'Dataset STM' });
  const draft = await createBuildRow(owner.id, { status: 'draft' });
  const run = (buildId: number, partId: number, status: 'pending' | 'accepted' | 'rejected', gainNmPerV = 10.37) =>
    createRunRow({ buildId, partId, ownerId: owner.id, gainNmPerV, status });
  ids.listed = listed.id;
  ids.proposed = proposed.id;
  ids.accepted = (await run(published.id, listed.id, 'accepted')).id;
  ids.pending = (await run(published.id, listed.id, 'pending')).id;
  ids.rejected = (await run(published.id, listed.id, 'rejected')).id;
  ids.inDraft = (await run(draft.id, listed.id, 'accepted', 55)).id;
  ids.ofProposed = (await run(published.id, proposed.id, 'accepted')).id;
  // A peak-to-peak reading in µm on the same actuator as the accepted run: other columns in points.csv.
  const first = await CalibrationRun.findByPk(ids.accepted);
  const p2p = {
    kind: 'peak-to-peak' as const,
    displacementPp: 8,
    voltsPp: 120,
    displacementUnit: 'um' as const,
    voltageUnit: 'V' as const,
    displacementResolution: 1,
    voltsResolution: 1,
    method: 'indicator' as const,
    frequencyHz: 5,
  };
  ids.p2p = (
    await CalibrationRun.create({
      actuatorId: first!.actuatorId,
      buildId: published.id,
      partId: listed.id,
      ownerId: owner.id,
      status: 'accepted',
      ...runColumns(p2p, fitRun(p2p)),
    })
  ).id;
  await Part.sequelize!.transaction(async (tx) => {
    await recomputePartStats(listed.id, tx);
    await recomputePartStats(proposed.id, tx);
  });
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/registry/dataset/runs.csv', () => {
  test('when a visitor downloads it, then it lists accepted runs of listed parts in published builds only, cacheable', async () => {
    const res = await request(t.app).get(`${BASE}/runs.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['cache-control']).toBe('public, max-age=300');
    const parsed = csv(res.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...RUN_COLUMNS]);
    const runIds = parsed.data.map((r) => Number(r.run_id));
    expect(runIds).toEqual(expect.arrayContaining([ids.accepted, ids.p2p]));
    for (const hidden of [ids.pending, ids.rejected, ids.inDraft, ids.ofProposed]) expect(runIds).not.toContain(hidden);
    expect(parsed.data.every((r) => r.status === 'accepted')).toBe(true);
  });

  test("when a run's row is read, then every figure equals what the run's page prints (one formatter), with part, build and maker", async () => {
    const parsed = csv((await request(t.app).get(`${BASE}/runs.csv`)).text);
    for (const runId of [ids.accepted, ids.p2p]) {
      const row = parsed.data.find((r) => Number(r.run_id) === runId)!;
      const page = (await request(t.app).get(`/api/runs/${runId}`).expect(200)).body as RunDto;
      const f = runPrintedFigures(page);
      expect(row.gain_nm_per_v).toBe(plainFigure(f.gain.value));
      expect(row.gain_plus_minus_nm_per_v).toBe(plainFigure(f.gain.uncertainty!));
      expect(row.r2).toBe(f.r2 === '—' ? '' : plainFigure(f.r2));
      expect(row.kind).toBe(page.kind);
      expect(row.points).toBe(String(page.pointCount));
      expect(row).toMatchObject({ part_id: String(ids.listed), build_title: 'Dataset STM', maker: ids.maker });
      // A name a spreadsheet would run as a formula is defused [practice: OWASP CSV injection].
      expect(row.part_name).toBe("'=Formula bar");
    }
    const p2p = parsed.data.find((r) => Number(r.run_id) === ids.p2p)!;
    expect(p2p.plus_minus_is).toBe('standard uncertainty (k = 1)');
    expect(p2p.gain_worst_case_low_nm_per_v).not.toBe('');
  });
});

describe('GET /api/registry/dataset/points.csv', () => {
  test('when downloaded, then each accepted run has its raw record in long format under run_id, and nothing else is there', async () => {
    const res = await request(t.app).get(`${BASE}/points.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=300');
    const parsed = csv(res.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields![0]).toBe('run_id');
    expect(res.text.split('\n')[1], 'no blank line after the header').not.toBe('');
    expect(parsed.meta.fields).toEqual(expect.arrayContaining(['volts_V', 'displacement_nm', 'sweep', 'displacement_um_peak_to_peak']));
    const runIds = new Set(parsed.data.map((r) => Number(r.run_id)));
    for (const hidden of [ids.pending, ids.rejected, ids.inDraft, ids.ofProposed]) expect(runIds.has(hidden)).toBe(false);
    const stored = await CalibrationRun.findByPk(ids.accepted);
    const points = JSON.parse(stored!.pointsJson) as Array<{ volts: number; displacement: number; sweep?: string }>;
    const rows = parsed.data.filter((r) => Number(r.run_id) === ids.accepted);
    expect(rows.map((r) => [Number(r.volts_V), Number(r.displacement_nm), r.sweep])).toEqual(
      points.map((p) => [p.volts, p.displacement, p.sweep ?? '']),
    );
    expect(rows.every((r) => r.displacement_um_peak_to_peak === '')).toBe(true);
    const reading = parsed.data.filter((r) => Number(r.run_id) === ids.p2p);
    expect(reading).toHaveLength(1);
    expect(reading[0]).toMatchObject({ displacement_um_peak_to_peak: '8', volts_V_peak_to_peak: '120', frequency_hz: '5', volts_V: '' });
  });
});

describe('GET /api/registry/dataset/parts.csv', () => {
  test('when downloaded, then listed parts carry their pooled figures rounded as the part page prints them; proposed parts are absent', async () => {
    const res = await request(t.app).get(`${BASE}/parts.csv`);
    expect(res.status).toBe(200);
    const parsed = csv(res.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...PART_COLUMNS]);
    expect(parsed.data.some((r) => Number(r.part_id) === ids.proposed)).toBe(false);
    const row = parsed.data.find((r) => Number(r.part_id) === ids.listed)!;
    const page = (await request(t.app).get(`/api/parts/${ids.listed}`).expect(200)).body as { stats: Record<string, number | null> };
    expect(row.gain_median_nm_per_v).toBe(plainFigure(formatShort(page.stats.gainMedianNmPerV)));
    expect(row.gain_p25_nm_per_v).toBe(plainFigure(formatShort(page.stats.gainP25NmPerV)));
    expect(row.hysteresis_median_pct_of_span).toBe(plainFigure(formatShort(page.stats.hysteresisMedianPct, 2)));
    expect(row.accepted_runs).toBe(String(page.stats.acceptedRunCount));
    expect(row.gain_median_nm_per_v).not.toBe('');
  });
});

describe('GET /api/registry/dataset/dataset.json and README.md', () => {
  test('when dataset.json is downloaded, then it holds the licence, parts and runs figures and no raw points', async () => {
    const res = await request(t.app).get(`${BASE}/dataset.json`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('public, max-age=300');
    expect(res.body.licence).toEqual(DATA_LICENCE);
    const run = (res.body.runs as Array<Record<string, string>>).find((r) => Number(r.run_id) === ids.accepted)!;
    expect(Object.keys(run)).toEqual([...RUN_COLUMNS]);
    expect((res.body.runs as Array<Record<string, string>>).some((r) => Number(r.run_id) === ids.pending)).toBe(false);
    expect((res.body.parts as Array<Record<string, string>>).some((p) => Number(p.part_id) === ids.listed)).toBe(true);
    expect(JSON.stringify(res.body)).not.toContain('"points":[');
  });

  test('when the README is read, then it names the licence, how to credit, every file and every column', async () => {
    const res = await request(t.app).get(`${BASE}/README.md`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/markdown/);
    expect(res.text).toContain(DATA_LICENCE.name);
    expect(res.text).toContain(DATA_LICENCE.url);
    expect(res.text).toContain(DATA_LICENCE.attribution);
    for (const file of ['parts.csv', 'runs.csv', 'points.csv', 'dataset.json']) expect(res.text).toContain(file);
    for (const column of [...PART_COLUMNS, ...RUN_COLUMNS, ...RUN_FIGURE_COLUMNS]) expect(res.text, column).toContain(column);
  });
});
