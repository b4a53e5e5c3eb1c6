// The stored fit of a lattice run: both lateral axes' figures solved from the vectors the page measured
// (lattice-figures.ts, where the sources are named), and the gain the run counts with in the registry.
// Counting rule [practice, ours]: a run on an X or a Y actuator counts with that axis's gain; on an XY actuator
// (one part driving both axes, e.g. a quartered tube or a bimorph driven two ways) with the mean of the two,
// u = √(u_x² + u_y²)/2 taking the axes' errors as independent [S: JCGM 100:2008 (GUM) 5.1.2]. One image is
// one run: counting both axes as two runs would weigh a single scan twice.
import type { ActuatorAxis } from '../schemas/actuator-vocabulary.ts';
import type { LatticeRunFiguresDto } from '../schemas/lattice.ts';
import type { LatticeRunInput } from '../schemas/run.ts';
import { latticeFigures } from './lattice-figures.ts';

/** A lattice run refused: the axis cannot take it, or the quarters gave no ± (400 with this code). */
export class LatticeRunError extends RangeError {
  constructor(
    readonly code: 'lattice_axis' | 'lattice_no_uncertainty',
    message: string,
  ) {
    super(message);
  }
}

export interface LatticeRunFit {
  gainNmPerV: number;
  gainStdUncertaintyNmPerV: number;
  spanNm: number;
  lattice: LatticeRunFiguresDto;
}

export function fitLatticeRun(input: LatticeRunInput, axis: ActuatorAxis): LatticeRunFit {
  if (axis === 'Z')
    throw new LatticeRunError('lattice_axis', 'A lattice image calibrates the lateral axes: record it on an X, Y or XY actuator, not Z.');
  const f = latticeFigures({
    lattice: input.lattice,
    width: input.image.width,
    height: input.image.height,
    peaks: input.peaks,
    quadrantPeaks: input.quadrantPeaks,
    scanSpanV: input.scanSpanV,
  });
  const u = f.standardUncertainty;
  if (!u || !f.nmPerPixel || !f.gainNmPerV || !f.gainMatrixNmPerV || !u.nmPerPixel || !u.gainNmPerV || u.skewDeg === null)
    throw new LatticeRunError(
      'lattice_no_uncertainty',
      'The quarters of the image gave too few estimates for a ±: a run needs the lattice found in at least three quarters.',
    );
  const gain = { x: f.gainNmPerV.x!, y: f.gainNmPerV.y! };
  const gainU = { x: u.gainNmPerV.x!, y: u.gainNmPerV.y! };
  const size = { x: f.nmPerPixel.x * input.image.width, y: f.nmPerPixel.y * input.image.height };
  const countsAs = axis === 'X' ? 'x' : axis === 'Y' ? 'y' : 'mean';
  const lattice: LatticeRunFiguresDto = {
    lattice: input.lattice,
    image: input.image,
    scanSpanV: input.scanSpanV,
    nmPerPixel: f.nmPerPixel,
    nmPerPixelU: u.nmPerPixel,
    gainNmPerV: gain,
    gainU,
    skewDeg: f.skewDeg!,
    skewDegU: u.skewDeg,
    rotationDeg: f.rotationDeg,
    crossCouplingNmPerV: f.gainMatrixNmPerV[0][1],
    crossCouplingU: u.crossCouplingNmPerV ?? 0,
    quadrants: u.quadrants,
    countsAs,
  };
  if (countsAs === 'mean')
    return {
      gainNmPerV: (gain.x + gain.y) / 2,
      gainStdUncertaintyNmPerV: Math.hypot(gainU.x, gainU.y) / 2,
      spanNm: (size.x + size.y) / 2,
      lattice,
    };
  return { gainNmPerV: gain[countsAs], gainStdUncertaintyNmPerV: gainU[countsAs], spanNm: size[countsAs], lattice };
}
