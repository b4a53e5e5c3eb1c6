import { z } from 'zod';
import { MAX_IMAGE_SIDE } from '../workbench/lattice.ts';

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
