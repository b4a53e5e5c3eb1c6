import { Router, type Response } from 'express';
import type { Config } from '../config.ts';
import {
  datasetJsonBody,
  datasetPartsCsv,
  datasetReadmeText,
  datasetRunsCsv,
  streamDatasetPoints,
} from '../services/registry-dataset.service.ts';
import { route } from './route.ts';

const BASE = '/api/registry/dataset';

/** Public and the same for everyone: caches may keep a copy for five minutes. */
const publicFile = (res: Response, type: string, filename: string) =>
  res.set('Cache-Control', 'public, max-age=300').type(type).attachment(filename);

/** The whole-registry dataset under the data licence: README, parts, runs, raw points and one JSON file. */
export function registryDatasetRoutes(config: Config): Router {
  const r = Router();
  r.get(
    `${BASE}/README.md`,
    route({}, async ({ res }) => {
      const text = await datasetReadmeText(config.publicUrl);
      res.set('Cache-Control', 'public, max-age=300').type('text/markdown; charset=utf-8').send(text);
    }),
  );
  r.get(
    `${BASE}/parts.csv`,
    route({}, async ({ res }) => {
      publicFile(res, 'text/csv; charset=utf-8', 'scanwright-parts.csv').send(await datasetPartsCsv(config.publicUrl));
    }),
  );
  r.get(
    `${BASE}/runs.csv`,
    route({}, async ({ res }) => {
      publicFile(res, 'text/csv; charset=utf-8', 'scanwright-runs.csv').send(await datasetRunsCsv(config.publicUrl));
    }),
  );
  r.get(
    `${BASE}/points.csv`,
    route({}, async ({ res }) => {
      publicFile(res, 'text/csv; charset=utf-8', 'scanwright-points.csv');
      await streamDatasetPoints(res);
      res.end();
    }),
  );
  r.get(
    `${BASE}/dataset.json`,
    route({}, async ({ res }) => {
      publicFile(res, 'application/json; charset=utf-8', 'scanwright-dataset.json').json(await datasetJsonBody(config.publicUrl));
    }),
  );
  return r;
}
