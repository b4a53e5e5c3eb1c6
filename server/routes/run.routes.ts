import { Router } from 'express';
import { actuatorIdParams } from '@shared/schemas/actuator.ts';
import { createRunInput, runExportQuery, runIdParams, updateRunInput } from '@shared/schemas/run.ts';
import type { Config } from '../config.ts';
import { requireUser } from '../middleware/auth.ts';
import { createRun, deleteRun, getRun, updateRun } from '../services/run.service.ts';
import { exportRun } from '../services/run-export.service.ts';
import { route } from './route.ts';

/** Calibration runs: recorded against an actuator; read, corrected, exported and deleted on their own. */
export function runRoutes(config: Config): Router {
  const r = Router();
  r.post(
    '/api/actuators/:actuatorId/runs',
    requireUser,
    route({ params: actuatorIdParams, body: createRunInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await createRun(actor, params.actuatorId, body));
    }),
  );
  r.get(
    '/api/runs/:runId',
    route({ params: runIdParams }, async ({ actor, params, res }) => {
      res.json(await getRun(actor, params.runId));
    }),
  );
  r.patch(
    '/api/runs/:runId',
    requireUser,
    route({ params: runIdParams, body: updateRunInput }, async ({ actor, params, body, res }) => {
      res.json(await updateRun(actor, params.runId, body));
    }),
  );
  r.get(
    '/api/runs/:runId/export',
    route({ params: runIdParams, query: runExportQuery }, async ({ actor, params, query, res }) => {
      const file = await exportRun(actor, params.runId, query.format, config.publicUrl);
      res.set('Content-Type', file.contentType).attachment(file.filename).send(file.body);
    }),
  );
  r.delete(
    '/api/runs/:runId',
    requireUser,
    route({ params: runIdParams }, async ({ actor, params, res }) => {
      await deleteRun(actor, params.runId);
      res.status(204).end();
    }),
  );
  return r;
}
