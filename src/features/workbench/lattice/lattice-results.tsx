import { formatFixed, formatSig } from '@shared/format/measured-number.ts';
import { Headline, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import type { LatticeResult } from './lattice-messages.ts';

/** Angles to 0.01°, finer than the analysis resolves them. */
const deg = (v: number | null) => (v === null ? '—' : `${formatFixed(v, 2)}°`);

/** nm per pixel, skew, rotation, gains and the peaks the lattice analysis chose. */
export function LatticeResults({ r, ms }: { r: LatticeResult; ms: number }) {
  const headline = r.nmPerPixel ? (
    <Headline label="Pixel size (x × y)" sub={`${r.width} × ${r.height} px image, analysed in ${Math.round(ms)} ms in your browser`}>
      <span className="num">
        {formatSig(r.nmPerPixel.x, 4)} × {formatSig(r.nmPerPixel.y, 4)} nm
      </span>
    </Headline>
  ) : (
    <Headline label="Pixel size along the grating's normal" sub="A line grating fixes one direction only.">
      <span className="num">{formatSig(r.alongNormal?.nmPerPixel, 4)} nm</span>
    </Headline>
  );
  return (
    <ResultPanel
      headline={headline}
      basis={
        'Plane removed, Hann window, 2-D FFT; peaks placed between bins by Gaussian interpolation (Gasior & Gonzalez 2004); ' +
        'the pixel-to-nm map takes the measured reciprocal vectors onto the ideal lattice’s, with x along the image rows. ' +
        'No ± is given: the peak positions carry no uncertainty estimate yet.'
      }
    >
      {r.nmPerPixel && (
        <>
          <ResultRow label="Image width × height" note="Pixel size times pixel count.">
            <span className="num">
              {formatSig(r.nmPerPixel.x * r.width, 4)} × {formatSig(r.nmPerPixel.y * r.height, 4)} nm
            </span>
          </ResultRow>
          <ResultRow label="Skew between the axes" note="Angle between the scan's x and y axes minus 90°.">
            <span className="num">{deg(r.skewDeg)}</span>
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
        <span className="num">{deg(r.rotationDeg)}</span>
      </ResultRow>
      {r.gainNmPerV && (
        <ResultRow label="Lateral gain x, y" note="Pixel size × pixel count ÷ the drive span of that axis.">
          <span className="num">
            {r.gainNmPerV.x === null ? '—' : formatSig(r.gainNmPerV.x, 4)}, {r.gainNmPerV.y === null ? '—' : formatSig(r.gainNmPerV.y, 4)}{' '}
            nm/V
          </span>
        </ResultRow>
      )}
      {r.gainMatrixNmPerV && (
        <ResultRow label="Cross-coupling (y drive into x)" note="Off-diagonal term of the gain matrix, x along the image rows.">
          <span className="num">{formatSig(r.gainMatrixNmPerV[0][1], 3)} nm/V</span>
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
