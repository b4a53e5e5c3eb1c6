import { Router } from 'express';
import type { Config } from '../config.ts';
import type { PhotoStore } from '../storage/photo-store.ts';
import Papa from 'papaparse';
import { listPartsQuery, mergePartInput, partIdParams, proposePartInput, type PartListItemDto } from '@shared/schemas/part.ts';
import { requireUser } from '../middleware/auth.ts';
import { exportParts, gainHistogram, getPart, listParts, proposePart } from '../services/part.service.ts';
import { mergeParts } from '../services/part-merge.service.ts';
import { photoRoutesFor } from './attached-photo.routes.ts';
import { route } from './route.ts';

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
export function partRoutes(config: Config, photos: PhotoStore): Router {
  const r = Router();
  r.get(
    '/api/parts',
    route({ query: listPartsQuery }, async ({ query, req, res }) => {
      const format =
        query.format ??
        (req.accepts(['application/json', 'text/csv']) === 'text/csv' && !req.accepts('application/json') ? 'csv' : undefined);
      if (!format) return void res.json(await listParts(query));
      const rows = await exportParts(query);
      const stamp = new Date().toISOString().slice(0, 10);
      res.attachment(`scanwright-parts-${stamp}.${format}`);
      if (format === 'json') return void res.json(rows);
      const csv = Papa.unparse(
        { fields: CSV_HEADERS, data: rows.map((p) => CSV_COLUMNS.map((c) => p[c] as unknown)) },
        { escapeFormulae: true },
      );
      res.type('text/csv').send(csv);
    }),
  );
  r.get(
    '/api/parts/histogram',
    route({}, async ({ res }) => {
      res.json(await gainHistogram());
    }),
  );
  r.post(
    '/api/parts',
    requireUser,
    route({ body: proposePartInput }, async ({ actor, body, res }) => {
      res.status(201).json(await proposePart(actor, body));
    }),
  );
  r.get(
    '/api/parts/:partId',
    route({ params: partIdParams }, async ({ actor, params, res }) => {
      res.json(await getPart(actor, params.partId));
    }),
  );
  r.post(
    '/api/parts/:partId/merge',
    requireUser,
    route({ params: partIdParams, body: mergePartInput }, async ({ actor, params, body, res }) => {
      res.json(await mergeParts(actor, params.partId, body));
    }),
  );
  r.use(photoRoutesFor('part', photos));
  return r;
}
