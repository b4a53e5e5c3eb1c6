// Route table rows (route-docs.ts): actuators of a build and their calibration runs.
import { actuatorIdParams, createActuatorInput, updateActuatorInput } from '@shared/schemas/actuator.ts';
import { driveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { driveTableQuery, saveLinearisationInput } from '@shared/schemas/linearise.ts';
import { buildIdParams } from '@shared/schemas/build.ts';
import { createRunInput, runExportQuery, runIdParams, updateRunInput } from '@shared/schemas/run.ts';
import { RIG_RUN_BODY } from '@shared/docs/rig-examples.ts';
import { json, noContent, type RouteDoc } from './route-doc.ts';

/** Actuators of a build and their calibration runs. */
export const actuatorDocs: readonly RouteDoc[] = [
  {
    method: 'POST',
    path: '/api/builds/:buildId/actuators',
    summary: 'Add an actuator (a registry part as used in the build)',
    tag: 'Actuators and runs',
    auth: 'session',
    params: buildIdParams,
    body: createActuatorInput,
    idempotent: true,
    response: json(201, 'The actuator.'),
    example: { partId: 7, label: 'Z bar', axis: 'Z', drive: 'single', maxVolts: 60 },
  },
  {
    method: 'PATCH',
    path: '/api/actuators/:actuatorId',
    summary: 'Edit an actuator',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: updateActuatorInput,
    response: json(200, 'The actuator.'),
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId',
    summary: 'Delete an actuator and its runs',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Deleted.'),
  },
  {
    method: 'PUT',
    path: '/api/actuators/:actuatorId/drive-matrix',
    summary: 'Save a two-axis drive matrix on an XY-pair actuator',
    description:
      'The gain matrix, offsets and drive limits from the mixing workbench; 201 when new, 200 when replaced; 409 `not_xy_pair` otherwise.',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: driveMatrixInput,
    response: json(200, 'The actuator with its drive matrix (201 when it had none).'),
    errors: [409],
    example: {
      gainNmPerV: [
        [70.7, -70.7],
        [70.7, 70.7],
      ],
      limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -150, vbMaxV: 150 },
    },
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId/drive-matrix',
    summary: "Remove an actuator's drive matrix",
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Removed.'),
  },
  {
    method: 'PUT',
    path: '/api/actuators/:actuatorId/linearisation',
    summary: 'Save a drive linearisation on an actuator',
    description:
      'The run to linearise (points with their sweeps, units, degree or "auto", table step); the server fits each branch and keeps ' +
      'the result and its drive table; 201 when new, 200 when replaced; 400 `not_monotonic` when a branch cannot be inverted.',
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    body: saveLinearisationInput,
    response: json(200, 'The actuator with its linearisation summary (201 when it had none).'),
    example: {
      points: [
        { volts: 0, displacement: 0, sweep: 'up' },
        { volts: 40, displacement: 2.6, sweep: 'up' },
        { volts: 80, displacement: 5.9, sweep: 'up' },
        { volts: 120, displacement: 9.9, sweep: 'up' },
      ],
      displacementUnit: 'um',
      degree: 2,
    },
  },
  {
    method: 'DELETE',
    path: '/api/actuators/:actuatorId/linearisation',
    summary: "Remove an actuator's linearisation",
    tag: 'Actuators and runs',
    auth: 'session',
    params: actuatorIdParams,
    response: noContent('Removed.'),
  },
  {
    method: 'GET',
    path: '/api/actuators/:actuatorId/linearisation/table',
    summary: "Download an actuator's drive table",
    description: 'CSV (`format=csv`, target_nm then the volts per branch) or a C array for a microcontroller (`format=c`).',
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: actuatorIdParams,
    query: driveTableQuery,
    response: { status: 200, description: 'The table as a file (text/csv, or text/x-c for format=c).', contentType: 'text/csv' },
  },
  {
    method: 'POST',
    path: '/api/actuators/:actuatorId/runs',
    summary: 'Record a calibration run',
    description:
      'Three kinds: `points` (a calibration curve, the default), `peak-to-peak` (two readings under a sine) and `sine-record` ' +
      '(time, drive and displacement samples). The server computes the fit; the run waits for review. At most 200 000 ' +
      'points or samples per run and 2 000 000 per build (413). Send an `Idempotency-Key` so a retry never stores it twice.',
    tag: 'Actuators and runs',
    auth: 'session-or-token',
    scope: 'runs:write',
    params: actuatorIdParams,
    body: createRunInput,
    idempotent: true,
    response: json(201, 'The stored run with its fit.'),
    errors: [413],
    example: RIG_RUN_BODY,
  },
  {
    method: 'GET',
    path: '/api/runs/:runId',
    summary: 'A run with its fit and plot series',
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: runIdParams,
    response: json(200, 'The run.'),
  },
  {
    method: 'PATCH',
    path: '/api/runs/:runId',
    summary: 'Correct a run',
    description: 'Merged over what is stored and refitted; an accepted run goes back to review.',
    tag: 'Actuators and runs',
    auth: 'session-or-token',
    scope: 'runs:write',
    params: runIdParams,
    body: updateRunInput,
    response: json(200, 'The run.'),
    errors: [413],
    example: { measuredOn: '2026-11-28', conditions: { temperatureC: 21.5, preload: 'spring, about 2 N' } },
  },
  {
    method: 'GET',
    path: '/api/runs/:runId/export',
    summary: "A run's raw points or samples as CSV or JSON, with the licence",
    tag: 'Actuators and runs',
    auth: 'visitor',
    params: runIdParams,
    query: runExportQuery,
    response: { status: 200, description: 'The file.', contentType: 'text/csv' },
  },
  {
    method: 'DELETE',
    path: '/api/runs/:runId',
    summary: 'Delete a run',
    tag: 'Actuators and runs',
    auth: 'session',
    params: runIdParams,
    response: noContent('Deleted.'),
  },
];
