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
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import {
  createBuild,
  deleteBuild,
  getBuild,
  listMyBuilds,
  listPublishedBuilds,
  submitBuild,
  updateBuild,
} from '../services/build.service.ts';
import { createEntry, deleteEntry, updateEntry } from '../services/entry.service.ts';

/** Builds and their log entries. */
export function buildRoutes(config: Config): Router {
  const r = Router();
  const id = validate(buildIdParams, 'params');
  r.get('/api/builds', validate(listBuildsQuery, 'query'), async (_req, res) => {
    res.json(await listPublishedBuilds(res.locals.query));
  });
  r.get('/api/builds/mine', requireUser, async (req, res) => {
    res.json(await listMyBuilds(actorOf(req)));
  });
  r.post('/api/builds', requireUser, validate(createBuildInput), async (req, res) => {
    res.status(201).json(await createBuild(actorOf(req), res.locals.body));
  });
  r.get('/api/builds/:buildId', id, async (req, res) => {
    res.json(await getBuild(actorOf(req), res.locals.params.buildId));
  });
  r.patch('/api/builds/:buildId', requireUser, id, validate(updateBuildInput), async (req, res) => {
    res.json(await updateBuild(actorOf(req), res.locals.params.buildId, res.locals.body));
  });
  r.delete('/api/builds/:buildId', requireUser, id, async (req, res) => {
    await deleteBuild(actorOf(req), res.locals.params.buildId, config.uploadsDir);
    res.status(204).end();
  });
  r.post('/api/builds/:buildId/submit', requireUser, id, async (req, res) => {
    res.json(await submitBuild(actorOf(req), res.locals.params.buildId));
  });

  r.post('/api/builds/:buildId/entries', requireUser, id, validate(createEntryInput), async (req, res) => {
    res.status(201).json(await createEntry(actorOf(req), res.locals.params.buildId, res.locals.body));
  });
  const entry = validate(entryParams, 'params');
  r.patch('/api/builds/:buildId/entries/:entryId', requireUser, entry, validate(updateEntryInput), async (req, res) => {
    res.json(await updateEntry(actorOf(req), res.locals.params.buildId, res.locals.params.entryId, res.locals.body));
  });
  r.delete('/api/builds/:buildId/entries/:entryId', requireUser, entry, async (req, res) => {
    await deleteEntry(actorOf(req), res.locals.params.buildId, res.locals.params.entryId);
    res.status(204).end();
  });
  return r;
}
