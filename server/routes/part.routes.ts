import { Router } from 'express';
import type { Config } from '../config.ts';
import Papa from 'papaparse';
import { listPartsQuery, mergePartInput, partIdParams, proposePartInput, type PartListItemDto } from '@shared/schemas/part.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { exportParts, gainHistogram, getPart, listParts, proposePart } from '../services/part.service.ts';
import { mergeParts } from '../services/part-merge.service.ts';
import { photoRoutesFor } from './attached-photo.routes.ts';

const CSV_COLUMNS: Array<keyof PartListItemDto> = [
  'id',
  'name',
  'category',
  'salvageSource',
  'material',
  'safeVolts',
  'capacitanceNf',
  'gainMedianNmPerV',
  'gainP25NmPerV',
  'gainP75NmPerV',
  'acceptedRunCount',
  'buildCount',
  'createdAt',
];
const CSV_HEADERS = [
  'id',
  'name',
  'category',
  'salvage_source',
  'material',
  'safe_volts_V',
  'capacitance_nF',
  'gain_median_nm_per_V',
  'gain_p25_nm_per_V',
  'gain_p75_nm_per_V',
  'accepted_runs',
  'builds',
  'created_at',
];

/** The parts registry: search (paged, or exported as CSV/JSON), histogram, detail, proposals, photos and merges. */
export function partRoutes(config: Config): Router {
  const r = Router();
  r.get('/api/parts', validate(listPartsQuery, 'query'), async (req, res) => {
    const q = res.locals.query;
    const format =
      q.format ?? (req.accepts(['application/json', 'text/csv']) === 'text/csv' && !req.accepts('application/json') ? 'csv' : undefined);
    if (!format) return void res.json(await listParts(q));
    const rows = await exportParts(q);
    const stamp = new Date().toISOString().slice(0, 10);
    res.attachment(`scanwright-parts-${stamp}.${format}`);
    if (format === 'json') return void res.json(rows);
    const csv = Papa.unparse(
      { fields: CSV_HEADERS, data: rows.map((p) => CSV_COLUMNS.map((c) => p[c] as unknown)) },
      { escapeFormulae: true },
    );
    res.type('text/csv').send(csv);
  });
  r.get('/api/parts/histogram', async (_req, res) => {
    res.json(await gainHistogram());
  });
  r.post('/api/parts', requireUser, validate(proposePartInput), async (req, res) => {
    res.status(201).json(await proposePart(actorOf(req), res.locals.body));
  });
  r.get('/api/parts/:partId', validate(partIdParams, 'params'), async (req, res) => {
    res.json(await getPart(actorOf(req), res.locals.params.partId));
  });
  r.post('/api/parts/:partId/merge', requireUser, validate(partIdParams, 'params'), validate(mergePartInput), async (req, res) => {
    res.json(await mergeParts(actorOf(req), res.locals.params.partId, res.locals.body));
  });
  r.use(photoRoutesFor('part', config.uploadsDir));
  return r;
}
