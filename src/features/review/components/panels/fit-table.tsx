import { formatPlusMinus } from '@shared/format/measured-number.ts';
import type { FitResultDto } from '@shared/schemas/workbench.ts';
import { halfWidth, sig } from '../format.ts';

/** The server's fit of a run as a table of measured numbers with units. */
export function FitTable({ fit }: { fit: FitResultDto }) {
  const [lo, hi] = fit.gainCi95NmPerV;
  const rows: [string, string][] = [
    ['Gain', formatPlusMinus(fit.gainNmPerV, halfWidth(fit.gainCi95NmPerV), 'ci95')],
    ['95 % interval', `${sig(lo, 4)} to ${sig(hi, 4)} nm/V`],
    ['Standard error', `${sig(fit.gainStdErrNmPerV, 2)} nm/V`],
    ['Intercept', `${sig(fit.interceptNm, 3)} nm`],
    ['R²', fit.r2 === null ? '—' : fit.r2.toFixed(4)],
    ['Residual std. dev.', `${sig(fit.residualStdNm, 2)} nm`],
    ['Span', `${sig(fit.spanNm, 3)} nm`],
    ['Nonlinearity', fit.nonlinearityPctFs === null ? '—' : `${sig(fit.nonlinearityPctFs, 2)} % of span`],
    ['Hysteresis', fit.hysteresisPctFs === null ? '—' : `${sig(fit.hysteresisPctFs, 2)} % of span`],
    ['Points', String(fit.n)],
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
