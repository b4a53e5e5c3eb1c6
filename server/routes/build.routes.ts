import { Router } from 'express';
import {
  buildIdParams,
  createBuildInput,
  createEntryInput,
  entryParams,
  listBuildsQuery,
  updateBuildInput,
  updateEntryInput,
} from '@shared/schemas/build.ts';
import type { Config } from '../config.ts';
import type { PhotoStore } from '../storage/photo-store.ts';
import { requireUser } from '../middleware/auth.ts';
import {
  createBuild,
  deleteBuild,
  getBuild,
  listMyBuilds,
  listPublishedBuilds,
  submitBuild,
  withdrawBuild,
  updateBuild,
} from '../services/build.service.ts';
import { createEntry, deleteEntry, updateEntry } from '../services/entry.service.ts';
import { route } from './route.ts';

/** Builds and their log entries. */
export function buildRoutes(config: Config, photos: PhotoStore): Router {
  const r = Router();
  r.get(
    '/api/builds',
    route({ query: listBuildsQuery }, async ({ query, res }) => {
      res.json(await listPublishedBuilds(query));
    }),
  );
  r.get(
    '/api/builds/mine',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await listMyBuilds(actor));
    }),
  );
  r.post(
    '/api/builds',
    requireUser,
    route({ body: createBuildInput }, async ({ actor, body, res }) => {
      res.status(201).json(await createBuild(actor, body));
    }),
  );
  r.get(
    '/api/builds/:buildId',
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      res.json(await getBuild(actor, params.buildId));
    }),
  );
  r.patch(
    '/api/builds/:buildId',
    requireUser,
    route({ params: buildIdParams, body: updateBuildInput }, async ({ actor, params, body, res }) => {
      res.json(await updateBuild(actor, params.buildId, body));
    }),
  );
  r.delete(
    '/api/builds/:buildId',
    requireUser,
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      await deleteBuild(actor, params.buildId, photos);
      res.status(204).end();
    }),
  );
  r.post(
    '/api/builds/:buildId/submit',
    requireUser,
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      res.json(await submitBuild(actor, params.buildId));
    }),
  );
  r.post(
    '/api/builds/:buildId/withdraw',
    requireUser,
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      res.json(await withdrawBuild(actor, params.buildId));
    }),
  );

  r.post(
    '/api/builds/:buildId/entries',
    requireUser,
    route({ params: buildIdParams, body: createEntryInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await createEntry(actor, params.buildId, body));
    }),
  );
  r.patch(
    '/api/builds/:buildId/entries/:entryId',
    requireUser,
    route({ params: entryParams, body: updateEntryInput }, async ({ actor, params, body, res }) => {
      res.json(await updateEntry(actor, params.buildId, params.entryId, body));
    }),
  );
  r.delete(
    '/api/builds/:buildId/entries/:entryId',
    requireUser,
    route({ params: entryParams }, async ({ actor, params, res }) => {
      await deleteEntry(actor, params.buildId, params.entryId);
      res.status(204).end();
    }),
  );
  return r;
}
