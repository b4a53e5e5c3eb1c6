// The actuator vocabulary (axes, drives and their words), apart from the zod schemas.

export const ACTUATOR_AXES = ['X', 'Y', 'Z', 'XY'] as const;
export type ActuatorAxis = (typeof ACTUATOR_AXES)[number];
export const ACTUATOR_DRIVES = ['single', 'pair-in-phase', 'pair-anti-phase', 'quartered-tube'] as const;
export type ActuatorDrive = (typeof ACTUATOR_DRIVES)[number];

export const actuatorDriveLabels: Record<ActuatorDrive, string> = {
  single: 'Single element',
  'pair-in-phase': 'Pair, in phase',
  'pair-anti-phase': 'Pair, anti-phase',
  'quartered-tube': 'Quartered tube',
};
