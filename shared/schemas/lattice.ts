import { z } from 'zod';
import { MAX_IMAGE_SIDE, MIN_IMAGE_SIDE } from '../workbench/lattice-limits.ts';

/** Lattice kinds the calibration knows. */
export const latticeKinds = ['hexagonal', 'square', 'line'] as const;

/**
 * Body of POST /api/workbench/lattice: a height image (rows of numbers), the lattice shown and its constant
 * (nm), and optionally the drive span in volts over the image's full width and height. Shape and finiteness
 * of the matrix are checked by the analysis, which answers with its own codes (not_rectangular, …).
 */
export const latticeInput = z.strictObject({
  heights: z.array(z.array(z.number())).max(MAX_IMAGE_SIDE + 1),
  lattice: z.strictObject({
    kind: z.enum(latticeKinds),
    constantNm: z.number().positive().finite(),
  }),
  scanSpanV: z.strictObject({ x: z.number().positive().finite(), y: z.number().positive().finite() }).optional(),
});
export type LatticeInput = z.infer<typeof latticeInput>;

/** A reciprocal vector measured in an image, cycles per pixel along x (columns) and y (rows). */
export const imageVector = z.strictObject({ kx: z.number().finite().min(-0.5).max(0.5), ky: z.number().finite().min(-0.5).max(0.5) });

/** What a lattice run stores besides its vectors: the lattice, the image's size and the drive spans. */
export const latticeRunFigures = z.strictObject({
  lattice: z.strictObject({ kind: z.enum(['hexagonal', 'square']), constantNm: z.number().positive().finite().max(1e6) }),
  image: z.strictObject({
    width: z.number().int().min(MIN_IMAGE_SIDE).max(MAX_IMAGE_SIDE),
    height: z.number().int().min(MIN_IMAGE_SIDE).max(MAX_IMAGE_SIDE),
  }),
  scanSpanV: z.strictObject({ x: z.number().positive().finite().max(5000), y: z.number().positive().finite().max(5000) }),
});

/** Both axes' figures of a lattice run, each with its standard uncertainty (k = 1), as stored with the run. */
export interface LatticeRunFiguresDto {
  lattice: { kind: 'hexagonal' | 'square'; constantNm: number };
  image: { width: number; height: number };
  scanSpanV: { x: number; y: number };
  nmPerPixel: { x: number; y: number };
  nmPerPixelU: { x: number; y: number };
  gainNmPerV: { x: number; y: number };
  gainU: { x: number; y: number };
  skewDeg: number;
  skewDegU: number;
  rotationDeg: number;
  crossCouplingNmPerV: number;
  crossCouplingU: number;
  quadrants: number;
  /** Which gain the run counts with: its actuator's axis, or the mean of x and y. */
  countsAs: 'x' | 'y' | 'mean';
}
