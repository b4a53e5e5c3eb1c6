// What the lattice analysis accepts and the thresholds it judges by.

/** Raised for images the lattice analysis cannot use; `code` becomes the API's error code. */
export class LatticeError extends RangeError {
  constructor(
    readonly code: 'not_rectangular' | 'image_too_large' | 'image_too_small' | 'no_periodicity' | 'non_finite_value',
    message: string,
  ) {
    super(message);
  }
}

export type LatticeKind = 'hexagonal' | 'square' | 'line';

export const MAX_IMAGE_SIDE = 1024;
export const MIN_IMAGE_SIDE = 16;
/** A peak weaker than this many times its ring's median is refused as no periodicity [practice]. */
export const NO_PERIODICITY_RATIO = 6;
/** A chosen peak weaker than this many times its ring's median gets a warning [practice]. */
export const WEAK_PEAK_RATIO = 15;
/** Fewer periods than this across the image along a chosen vector gets a warning [practice]. */
export const MIN_PERIODS = 5;
