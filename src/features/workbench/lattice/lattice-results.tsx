import { formatFixed, formatSig, formatWithUncertainty, unitSuffix } from '@shared/format/measured-number.ts';
import { Headline, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import type { LatticeResult } from './lattice-messages.ts';

/** Angles to 0.01° when no ± says otherwise. */
const deg = (v: number | null) => (v === null ? '—' : `${formatFixed(v, 2)}°`);
/** A figure with its standard uncertainty (k = 1, said once in the basis) when the quarters gave one. */
const pm = (v: number, u: number | null | undefined, unit: string) => {
  const f = formatWithUncertainty(v, u ?? null);
  return `${f.value}${f.uncertainty === null ? '' : ` ± ${f.uncertainty}`}${unitSuffix(unit)}`.replace(/-/g, '−');
};
const pmDeg = (v: number | null, u: number | null | undefined) => (v === null ? '—' : u ? pm(v, u, '°') : deg(v));

/** nm per pixel, skew, rotation, gains and the peaks the lattice analysis chose, each with its ±. */
export function LatticeResults({ r, ms }: { r: LatticeResult; ms: number }) {
  const u = r.standardUncertainty;
  const headline = r.nmPerPixel ? (
    <Headline label="Pixel size (x × y)" sub={`${r.width} × ${r.height} px image, analysed in ${Math.round(ms)} ms in your browser`}>
      <span className="num">
        {formatSig(r.nmPerPixel.x, 4)} × {formatSig(r.nmPerPixel.y, 4)} nm
      </span>
    </Headline>
  ) : (
    <Headline label="Pixel size along the grating's normal" sub="A line grating fixes one direction only.">
      <span className="num">{r.alongNormal ? pm(r.alongNormal.nmPerPixel, u?.alongNormalNmPerPixel, 'nm') : '—'}</span>
    </Headline>
  );
  return (
    <ResultPanel
      headline={headline}
      basis={
        'Plane removed, Hann window, 2-D FFT; peaks placed between bins by Gaussian interpolation (Gasior & Gonzalez 2004); ' +
        'the pixel-to-nm map takes the measured reciprocal vectors onto the ideal lattice’s, with x along the image rows. ' +
        (u
          ? `Every ± is a standard uncertainty (u, k = 1, GUM): the scatter of the same figures from the image’s ${u.quadrants} quarters (s/√n), ` +
            'which also catches drift and creep across the scan, combined with the interpolation’s largest bias (0.016 bin, rectangular).'
          : 'No ± : the lattice was not found in at least three quarters of the image.')
      }
    >
      {r.nmPerPixel && (
        <>
          <ResultRow label="Pixel size x" note="Along the image rows.">
            <span className="num">{pm(r.nmPerPixel.x, u?.nmPerPixel?.x, 'nm')}</span>
          </ResultRow>
          <ResultRow label="Pixel size y" note="Along the image columns, corrected for skew.">
            <span className="num">{pm(r.nmPerPixel.y, u?.nmPerPixel?.y, 'nm')}</span>
          </ResultRow>
          <ResultRow label="Image width × height" note="Pixel size times pixel count.">
            <span className="num">
              {formatSig(r.nmPerPixel.x * r.width, 4)} × {formatSig(r.nmPerPixel.y * r.height, 4)} nm
            </span>
          </ResultRow>
          <ResultRow label="Skew between the axes" note="Angle between the scan's x and y axes minus 90°.">
            <span className="num">{pmDeg(r.skewDeg, u?.skewDeg)}</span>
          </ResultRow>
        </>
      )}
      {r.alongNormal && (
        <ResultRow label="Grating normal" note="Angle of the normal to the lines from the image's x axis.">
          <span className="num">{deg(r.alongNormal.angleDeg)}</span>
        </ResultRow>
      )}
      <ResultRow
        label="Lattice rotation"
        note={
          r.nmPerPixel ? 'Angle of a row of the lattice from the image’s x axis.' : 'Angle of the grating’s lines from the image’s x axis.'
        }
      >
        <span className="num">{pmDeg(r.rotationDeg, u?.rotationDeg)}</span>
      </ResultRow>
      {r.gainNmPerV && (
        <>
          <ResultRow label="Lateral gain x" note="Pixel size × pixel count ÷ the drive span of x.">
            <span className="num">{r.gainNmPerV.x === null ? '—' : pm(r.gainNmPerV.x, u?.gainNmPerV?.x, 'nm/V')}</span>
          </ResultRow>
          <ResultRow label="Lateral gain y" note="Pixel size × pixel count ÷ the drive span of y.">
            <span className="num">{r.gainNmPerV.y === null ? '—' : pm(r.gainNmPerV.y, u?.gainNmPerV?.y, 'nm/V')}</span>
          </ResultRow>
        </>
      )}
      {r.gainMatrixNmPerV && (
        <ResultRow label="Cross-coupling (y drive into x)" note="Off-diagonal term of the gain matrix, x along the image rows.">
          <span className="num">{pm(r.gainMatrixNmPerV[0][1], u?.crossCouplingNmPerV, 'nm/V')}</span>
        </ResultRow>
      )}
      {r.peaks.map((p, i) => (
        <ResultRow key={i} label={`Peak ${i + 1}`} note={`${formatSig(p.strength, 3)} × its ring's median`}>
          <span className="num">
            period {formatSig(p.periodPx, 4)} px at {deg((Math.atan2(p.ky, p.kx) * 180) / Math.PI)}
          </span>
        </ResultRow>
      ))}
    </ResultPanel>
  );
}
