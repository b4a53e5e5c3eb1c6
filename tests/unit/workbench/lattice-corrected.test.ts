// The corrected image (shared/workbench/lattice-corrected.ts): a lattice generated through a skewed,
// anisotropic pixel → nm map, redrawn through the solved map, analysed again, shows a square grid — equal
// scales and no skew — and the ideal sites fall on its maxima [calc].
import { describe, expect, test } from 'vitest';
import { analyseLattice } from '../../../shared/workbench/lattice.ts';
import { correctedImage, latticeSites } from '../../../shared/workbench/lattice-corrected.ts';
import { makeImage } from '../../support/lattice-images.ts';

describe('corrected image', () => {
  const scene = { kind: 'hexagonal' as const, a: 0.246, sx: 0.012, sy: 0.015, skewDeg: 4, rotationDeg: 10, nx: 256, ny: 256, noise: 0.1 };
  const rows = makeImage(scene);
  const r = analyseLattice(rows, { kind: 'hexagonal', constantNm: 0.246 });
  const img = correctedImage(rows, r.pixelToNm!, 512);

  test('re-analysed, its pixels are square and its axes orthogonal, at the step it states [calc]', () => {
    // The central square lies inside the scanned parallelogram (a 4° skew moves the edge by < 7 %) [calc].
    const side = Math.floor(Math.min(img.width, img.height) * 0.6);
    const x0 = Math.floor((img.width - side) / 2);
    const y0 = Math.floor((img.height - side) / 2);
    const crop = Array.from({ length: side }, (_, j) =>
      Array.from(img.data.subarray((y0 + j) * img.width + x0, (y0 + j) * img.width + x0 + side)),
    );
    expect(crop.flat().every(Number.isFinite)).toBe(true);
    const again = analyseLattice(crop, { kind: 'hexagonal', constantNm: 0.246 });
    expect(Math.abs(again.nmPerPixel!.x / img.nmPerPixel - 1)).toBeLessThan(0.01);
    expect(Math.abs(again.nmPerPixel!.y / img.nmPerPixel - 1)).toBeLessThan(0.01);
    expect(Math.abs(again.skewDeg!)).toBeLessThan(0.5);
  });

  test('the ideal sites sit on bright points: their mean height is well above the image’s mean [calc]', () => {
    const sites = latticeSites(img, { kind: 'hexagonal', constantNm: 0.246 }, r.rotationDeg);
    expect(sites.length).toBeGreaterThan(100);
    const at = (s: { x: number; y: number }) => img.data[Math.round(s.y) * img.width + Math.round(s.x)]!;
    const defined = Array.from(img.data).filter(Number.isFinite);
    const mean = defined.reduce((a, b) => a + b, 0) / defined.length;
    const max = Math.max(...defined);
    const siteMean = sites
      .map(at)
      .filter(Number.isFinite)
      .reduce((a, b, _, arr) => a + b / arr.length, 0);
    // Three unit cosines peak at 3 on the sites [calc]: the sites' mean is within the top third of the range.
    expect(siteMean - mean).toBeGreaterThan(0.66 * (max - mean));
  });
});
