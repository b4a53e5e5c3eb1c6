// A lattice run's figures as labelled lines, each value with its standard uncertainty, for every place that
// shows a stored run (build page, editor, review desk) so they all word and round it alike.
import type { LatticeRunFiguresDto } from '../schemas/lattice.ts';
import { formatPlusMinus, formatSig } from './measured-number.ts';

const countsAsWords: Record<LatticeRunFiguresDto['countsAs'], string> = {
  x: 'the x gain (an X actuator)',
  y: 'the y gain (a Y actuator)',
  mean: 'the mean of x and y (an XY actuator)',
};

export function latticeRunLines(l: LatticeRunFiguresDto): Array<[string, string]> {
  return [
    ['Gain x', formatPlusMinus(l.gainNmPerV.x, l.gainU.x, 'std')],
    ['Gain y', formatPlusMinus(l.gainNmPerV.y, l.gainU.y, 'std')],
    ['Counts in the registry as', countsAsWords[l.countsAs]],
    ['Pixel size x', formatPlusMinus(l.nmPerPixel.x, l.nmPerPixelU.x, 'std', 'nm')],
    ['Pixel size y', formatPlusMinus(l.nmPerPixel.y, l.nmPerPixelU.y, 'std', 'nm')],
    ['Skew between the axes', formatPlusMinus(l.skewDeg, l.skewDegU, 'std', '°')],
    ['Cross-coupling (y drive into x)', formatPlusMinus(l.crossCouplingNmPerV, l.crossCouplingU, 'std')],
    [
      'Reference',
      `${l.lattice.kind} lattice, a = ${formatSig(l.lattice.constantNm)} nm; image ${l.image.width} × ${l.image.height} px; ` +
        `spans ${formatSig(l.scanSpanV.x)} V × ${formatSig(l.scanSpanV.y)} V; ± from ${l.quadrants} quarters`,
    ],
  ];
}
