import { formatPlusMinus } from '@shared/format/measured-number.ts';
import type { RunFitDto } from '@shared/schemas/run.ts';
import { runGainPlusMinus } from '@shared/export/run-figures.ts';
import { sig } from '../format.ts';

/** The server's fit of a run as a table of measured numbers with units. */
export function FitTable({ fit }: { fit: RunFitDto }) {
  const pm = runGainPlusMinus(fit);
  const ci = fit.gainCi95NmPerV;
  const rows: [string, string][] = [
    ['Gain', formatPlusMinus(fit.gainNmPerV, pm.halfWidth, pm.kind)],
    ...(ci ? [['95 % interval', `${sig(ci[0], 4)} to ${sig(ci[1], 4)} nm/V`] as [string, string]] : []),
    ...(fit.gainBoundsNmPerV
      ? [['Worst-case bounds', `${sig(fit.gainBoundsNmPerV[0], 4)} to ${sig(fit.gainBoundsNmPerV[1], 4)} nm/V`] as [string, string]]
      : []),
    ...(fit.sine
      ? [
          ['Drive frequency', `${sig(fit.sine.frequencyHz, 4)} Hz`] as [string, string],
          ['Phase lag', `${sig(fit.sine.phaseLagDeg, 3)}°`] as [string, string],
        ]
      : []),
    [ci ? 'Standard error' : 'Standard uncertainty', `${sig(fit.gainStdErrNmPerV, 2)} nm/V`],
    // A reading of two values has no line, residuals or loop to speak of.
    ...((fit.gainBoundsNmPerV
      ? []
      : [
          [fit.sine ? 'Displacement offset' : 'Intercept', `${sig(fit.interceptNm, 3)} nm`],
          ['R²', fit.r2 === null ? '—' : fit.r2.toFixed(4)],
          ['Residual std. dev.', `${sig(fit.residualStdNm, 2)} nm`],
        ]) as [string, string][]),
    ['Span', `${sig(fit.spanNm, 3)} nm`],
    ...((fit.gainBoundsNmPerV || fit.sine
      ? []
      : [
          ['Nonlinearity', fit.nonlinearityPctFs === null ? '—' : `${sig(fit.nonlinearityPctFs, 2)} % of span`],
          ['Hysteresis', fit.hysteresisPctFs === null ? '—' : `${sig(fit.hysteresisPctFs, 2)} % of span`],
        ]) as [string, string][]),
    [fit.gainBoundsNmPerV ? 'Readings' : fit.sine ? 'Samples' : 'Points', String(fit.n)],
  ];
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">Fit of this calibration run</caption>
      <tbody>
        {rows.map(([k, v]) => (
          <tr key={k} className="border-b border-rule last:border-0">
            <th scope="row" className="py-1 pr-3 text-left font-normal text-ink-soft">
              {k}
            </th>
            <td className="num py-1 text-right">{v}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
