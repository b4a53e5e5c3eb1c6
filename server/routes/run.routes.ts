import { Router } from 'express';
import { actuatorIdParams } from '@shared/schemas/actuator.ts';
import { createRunInput, runIdParams } from '@shared/schemas/run.ts';
import { requireUser } from '../middleware/auth.ts';
import { createRun, deleteRun, getRun } from '../services/run.service.ts';
import { route } from './route.ts';

/** Calibration runs: recorded against an actuator, read and deleted on their own. */
export function runRoutes(): Router {
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
