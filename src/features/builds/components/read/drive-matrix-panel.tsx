import { lazy, Suspense } from 'react';
import type { DriveMatrixDto } from '@shared/schemas/drive-matrix.ts';
import { invertGain, reachableRegionWithOffset } from '@shared/workbench/mixing.ts';
import { assessSafety, largestMagnitude } from '@shared/workbench/safety.ts';
import { formatSig } from '@shared/format/measured-number.ts';
import { formatDate } from '@shared/format/dates.ts';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { ErrorBoundary } from '@/components/ui/error-boundary.tsx';

const DriveRegionChart = lazy(() => import('./drive-region-chart.tsx').then((m) => ({ default: m.DriveRegionChart })));

function Matrix({
  caption,
  rows,
  unit,
  rowNames,
  colNames,
}: {
  caption: string;
  rows: readonly (readonly number[])[];
  unit: string;
  rowNames: readonly [string, string];
  colNames: readonly [string, string];
}) {
  return (
    <table className="text-sm">
      <caption className="mb-1 text-left text-xs text-ink-soft">
        {caption} ({unit})
      </caption>
      <thead className="text-xs text-ink-soft">
        <tr>
          <td />
          {colNames.map((c) => (
            <th key={c} scope="col" className="px-2 font-medium">
              {c}
            </th>
          ))}
        </tr>
      </thead>
      <tbody className="num">
        {rows.map((r, i) => (
          <tr key={rowNames[i]}>
            <th scope="row" className="pr-2 text-left text-xs font-medium text-ink-soft">
              {rowNames[i]}
            </th>
            {r.map((v, j) => (
              <td key={colNames[j]} className="px-2 text-right">
                {formatSig(v)}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** G⁻¹ in V per µm, or null for a matrix that has none (a saved one always has; an odd stored value shows without it). */
function inverseInVoltsPerUm(matrix: DriveMatrixDto): number[][] | null {
  try {
    return invertGain(matrix.gainNmPerV).map((r) => r.map((v) => v * 1000));
  } catch {
    return null;
  }
}

/**
 * A two-axis mixer result saved on an XY pair: G, its inverse (the volts for a wanted position, here in
 * V per µm), the offsets and drive limits, the reachable region, and the cautions where the limits are hazardous.
 */
export function DriveMatrixPanel({ matrix, headingLevel = 4 }: { matrix: DriveMatrixDto; headingLevel?: 3 | 4 }) {
  const H = headingLevel === 3 ? 'h3' : 'h4';
  const { limits } = matrix;
  const inverse = inverseInVoltsPerUm(matrix);
  const region = reachableRegionWithOffset(matrix.gainNmPerV, limits, matrix.offsetNm);
  // A drive limit bounds whatever waveform is sent: judged as a peak, as on the mixer page.
  const safety = assessSafety({ peakV: largestMagnitude([limits.vaMinV, limits.vaMaxV, limits.vbMinV, limits.vbMaxV]) });
  return (
    <section aria-label="Drive matrix" className="space-y-3 rounded-md border border-rule bg-paper/40 p-3">
      <H className="text-sm font-semibold">Drive matrix (two-axis mixer)</H>
      <p className="text-xs text-ink-soft">
        x = x₀ + G·V {matrix.model === 'affine' ? '(fitted with offsets)' : '(through the origin)'}
        {matrix.measuredOn ? `, measured on ${formatDate(matrix.measuredOn)}` : ''}, saved {formatDate(matrix.savedAt)}.
      </p>
      {safety.crossed.length > 0 && <SafetyNotice cautions={safety.cautions} crossed={safety.crossed} />}
      <div className="grid gap-4 sm:grid-cols-[auto_minmax(0,1fr)]">
        <div className="space-y-3">
          <Matrix caption="G, tip motion per volt" rows={matrix.gainNmPerV} unit="nm/V" rowNames={['x', 'y']} colNames={['Va', 'Vb']} />
          {inverse && (
            <Matrix
              caption="G⁻¹, volts for a wanted position"
              rows={inverse}
              unit="V per µm"
              rowNames={['Va', 'Vb']}
              colNames={['x', 'y']}
            />
          )}
          <dl className="grid grid-cols-[auto_auto] gap-x-3 gap-y-1 text-sm">
            <dt className="text-ink-soft">Offsets x₀, y₀</dt>
            <dd className="num">
              {formatSig(matrix.offsetNm[0])}, {formatSig(matrix.offsetNm[1])} nm
            </dd>
            <dt className="text-ink-soft">Va limits</dt>
            <dd className="num">
              {formatSig(limits.vaMinV)} to {formatSig(limits.vaMaxV)} V
            </dd>
            <dt className="text-ink-soft">Vb limits</dt>
            <dd className="num">
              {formatSig(limits.vbMinV)} to {formatSig(limits.vbMaxV)} V
            </dd>
          </dl>
        </div>
        <figure className="w-full max-w-[300px] min-w-0">
          <ErrorBoundary fallback={<p className="text-sm text-ink-soft">The plot could not be drawn.</p>}>
            <Suspense fallback={<div className="aspect-square animate-pulse rounded bg-paper-deep" />}>
              <DriveRegionChart region={region} rest={{ xNm: matrix.offsetNm[0], yNm: matrix.offsetNm[1] }} />
            </Suspense>
          </ErrorBoundary>
          <figcaption className="mt-1 text-xs text-ink-soft">
            Teal: every tip position the drive limits reach; the black dot is the rest position (x₀, y₀).
          </figcaption>
        </figure>
      </div>
    </section>
  );
}
