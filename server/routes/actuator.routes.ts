import { Router } from 'express';
import { buildIdParams } from '@shared/schemas/build.ts';
import { actuatorIdParams, createActuatorInput, updateActuatorInput } from '@shared/schemas/actuator.ts';
import { createRunInput, runIdParams } from '@shared/schemas/run.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { createActuator, deleteActuator, updateActuator } from '../services/actuator.service.ts';
import { createRun, deleteRun, getRun } from '../services/run.service.ts';

/** Actuators of a build and their calibration runs. */
export function actuatorRoutes(): Router {
  const r = Router();
  const actuator = validate(actuatorIdParams, 'params');
  const run = validate(runIdParams, 'params');
  r.post(
    '/api/builds/:buildId/actuators',
    requireUser,
    validate(buildIdParams, 'params'),
    validate(createActuatorInput),
    async (req, res) => {
      res.status(201).json(await createActuator(actorOf(req), res.locals.params.buildId, res.locals.body));
    },
  );
  r.patch('/api/actuators/:actuatorId', requireUser, actuator, validate(updateActuatorInput), async (req, res) => {
    res.json(await updateActuator(actorOf(req), res.locals.params.actuatorId, res.locals.body));
  });
  r.delete('/api/actuators/:actuatorId', requireUser, actuator, async (req, res) => {
    await deleteActuator(actorOf(req), res.locals.params.actuatorId);
    res.status(204).end();
  });
  r.post('/api/actuators/:actuatorId/runs', requireUser, actuator, validate(createRunInput), async (req, res) => {
    res.status(201).json(await createRun(actorOf(req), res.locals.params.actuatorId, res.locals.body));
  });
  r.get('/api/runs/:runId', run, async (req, res) => {
    res.json(await getRun(actorOf(req), res.locals.params.runId));
  });
  r.delete('/api/runs/:runId', requireUser, run, async (req, res) => {
    await deleteRun(actorOf(req), res.locals.params.runId);
    res.status(204).end();
  });
  return r;
}
