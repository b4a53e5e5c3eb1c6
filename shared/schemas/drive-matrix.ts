import { z } from 'zod';
import { driveLimits } from './workbench.ts';
import { mixingSinAngle, MIN_MIXING_SIN_ANGLE, type GainMatrix } from '../workbench/mixing.ts';

const finite = z.number().finite();
const row = z.tuple([finite, finite]);

/** Affine x = x₀ + G·V (offsets fitted) or through the origin (offsets zero), as the mixer's grid fit names them. */
export const DRIVE_MATRIX_MODELS = ['affine', 'origin'] as const;
export type DriveMatrixModel = (typeof DRIVE_MATRIX_MODELS)[number];

/**
 * A two-axis mixer result saved onto an XY-pair actuator: G (nm/V, rows x and y, columns Va and Vb),
 * the offsets x₀, y₀ (nm), the drive limits (V), the fit model and the day it was measured.
 * G must have an inverse (the page commands positions through G⁻¹); a model through the origin has zero offsets.
 */
export const driveMatrixInput = z
  .strictObject({
    gainNmPerV: z.tuple([row, row]),
    offsetNm: row.default([0, 0]),
    limits: driveLimits,
    model: z.enum(DRIVE_MATRIX_MODELS).default('affine'),
    measuredOn: z.iso.date().optional(),
  })
  .superRefine((v, ctx) => {
    if (!(mixingSinAngle(v.gainNmPerV as GainMatrix) > MIN_MIXING_SIN_ANGLE)) {
      ctx.addIssue({
        code: 'custom',
        path: ['gainNmPerV'],
        message: 'The two actuators move along the same line: this gain matrix has no inverse.',
      });
    }
    if (v.model === 'origin' && (v.offsetNm[0] !== 0 || v.offsetNm[1] !== 0)) {
      ctx.addIssue({ code: 'custom', path: ['offsetNm'], message: 'A fit through the origin has zero offsets.' });
    }
  });
export type DriveMatrixInput = z.infer<typeof driveMatrixInput>;

/** The saved drive matrix as stored and shown (`savedAt` set by the server). */
export interface DriveMatrixDto {
  gainNmPerV: [[number, number], [number, number]];
  offsetNm: [number, number];
  limits: { vaMinV: number; vaMaxV: number; vbMinV: number; vbMaxV: number };
  model: DriveMatrixModel;
  measuredOn: string | null;
  savedAt: string;
}

/** What the `drive_matrix_json` column holds, read back leniently: an unreadable value counts as none. */
export const storedDriveMatrix = z.object({
  gainNmPerV: z.tuple([row, row]),
  offsetNm: row,
  limits: z.object({ vaMinV: finite, vaMaxV: finite, vbMinV: finite, vbMaxV: finite }),
  model: z.enum(DRIVE_MATRIX_MODELS),
  measuredOn: z.string().nullable(),
  savedAt: z.string(),
});
