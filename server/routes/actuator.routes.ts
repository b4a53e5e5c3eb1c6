import { Router } from 'express';
import { buildIdParams } from '@shared/schemas/build.ts';
import { actuatorIdParams, createActuatorInput, updateActuatorInput } from '@shared/schemas/actuator.ts';
import { requireUser } from '../middleware/auth.ts';
import { createActuator, deleteActuator, updateActuator } from '../services/actuator.service.ts';
import { route } from './route.ts';
import { driveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { clearDriveMatrix, saveDriveMatrix } from '../services/drive-matrix.service.ts';
import { driveTableQuery, saveLinearisationInput } from '@shared/schemas/linearise.ts';
import { clearLinearisation, driveTableFile, saveLinearisation } from '../services/linearisation.service.ts';

/** The actuators of a build (their calibration runs are in run.routes.ts). */
export function actuatorRoutes(): Router {
  const r = Router();
  r.post(
    '/api/builds/:buildId/actuators',
    requireUser,
    route({ params: buildIdParams, body: createActuatorInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await createActuator(actor, params.buildId, body));
    }),
  );
  r.patch(
    '/api/actuators/:actuatorId',
    requireUser,
    route({ params: actuatorIdParams, body: updateActuatorInput }, async ({ actor, params, body, res }) => {
      res.json(await updateActuator(actor, params.actuatorId, body));
    }),
  );
  r.delete(
    '/api/actuators/:actuatorId',
    requireUser,
    route({ params: actuatorIdParams }, async ({ actor, params, res }) => {
      await deleteActuator(actor, params.actuatorId);
      res.status(204).end();
    }),
  );
  r.put(
    '/api/actuators/:actuatorId/drive-matrix',
    requireUser,
    route({ params: actuatorIdParams, body: driveMatrixInput }, async ({ actor, params, body, res }) => {
      const { actuator, created } = await saveDriveMatrix(actor, params.actuatorId, body);
      res.status(created ? 201 : 200).json(actuator);
    }),
  );
  r.delete(
    '/api/actuators/:actuatorId/drive-matrix',
    requireUser,
    route({ params: actuatorIdParams }, async ({ actor, params, res }) => {
      await clearDriveMatrix(actor, params.actuatorId);
      res.status(204).end();
    }),
  );
  r.put(
    '/api/actuators/:actuatorId/linearisation',
    requireUser,
    route({ params: actuatorIdParams, body: saveLinearisationInput }, async ({ actor, params, body, res }) => {
      const { actuator, created } = await saveLinearisation(actor, params.actuatorId, body);
      res.status(created ? 201 : 200).json(actuator);
    }),
  );
  r.delete(
    '/api/actuators/:actuatorId/linearisation',
    requireUser,
    route({ params: actuatorIdParams }, async ({ actor, params, res }) => {
      await clearLinearisation(actor, params.actuatorId);
      res.status(204).end();
    }),
  );
  r.get(
    '/api/actuators/:actuatorId/linearisation/table',
    route({ params: actuatorIdParams, query: driveTableQuery }, async ({ actor, params, query, res }) => {
      const file = await driveTableFile(actor, params.actuatorId, query.format);
      res.set('Content-Type', file.contentType).attachment(file.filename).send(file.body);
    }),
  );
  return r;
}
