import { formatFixed, formatLengthNm, formatR2, formatSig } from '@shared/format/measured-number.ts';
import { Gain, Headline, Quantity, ResultPanel, ResultRow } from '../components/results.tsx';
import type { FitCalculation } from './fit-form.ts';

const pct = (v: number | null) => ({ value: formatSig(v, 3), unit: '% of span' });

/** Gain with its 95 % interval and the quality figures of a calibration run. */
export function FitResults({ fit }: { fit: FitCalculation }) {
  const half = (fit.gainCi95NmPerV[1] - fit.gainCi95NmPerV[0]) / 2;
  const origin = fit.model === 'origin';
  return (
    <ResultPanel
      headline={
        <Headline
          label="Gain"
          sub={
            <>
              ± half-width of the 95 % interval (t = <span className="num">{formatFixed(fit.tCritical95, 3)}</span>,{' '}
              <span className="num">{fit.df}</span> degrees of freedom).
            </>
          }
        >
          <Gain value={fit.gainNmPerV} plusMinus={half} kind="ci95" />
        </Headline>
      }
      basis={
        'Least squares with NIST StRD conventions (R² uncentred through the origin). Nonlinearity: independent ' +
        'linearity on the calibration curve, the largest gap between the up-and-down average at a voltage and the line, ' +
        '÷ span (Source: ISA-51.1 terms, recalled clause). Hysteresis: widest gap between the up and down sweeps at ' +
        'shared voltages ÷ span (common practice).'
      }
    >
      <ResultRow label="95 % interval">
        <span className="whitespace-nowrap">
          <span className="num">
            {formatSig(fit.gainCi95NmPerV[0])} – {formatSig(fit.gainCi95NmPerV[1])}
          </span>{' '}
          nm/V
        </span>
      </ResultRow>
      <ResultRow label="Intercept" note={origin ? 'Forced through the origin.' : undefined}>
        <Quantity q={origin ? { value: '0', unit: 'nm' } : formatLengthNm(fit.interceptNm)} />
      </ResultRow>
      <ResultRow label={origin ? 'R² (uncentred)' : 'R²'}>
        <Quantity q={{ value: formatR2(fit.r2), unit: '' }} />
      </ResultRow>
      <ResultRow label="Residual SD">
        <Quantity q={formatLengthNm(fit.residualStdNm)} />
      </ResultRow>
      <ResultRow
        label="Span"
        note={
          <>
            |gain| × (V<sub>max</sub> − V<sub>min</sub>) over{' '}
            <span className="num">
              {formatSig(fit.voltsMinV)} … {formatSig(fit.voltsMaxV)}
            </span>{' '}
            V.
          </>
        }
      >
        <Quantity q={formatLengthNm(fit.spanNm)} />
      </ResultRow>
      <ResultRow
        label="Nonlinearity"
        note="Up and down sweeps averaged at each voltage, then compared with the line: a loop alone is hysteresis, not nonlinearity."
      >
        <Quantity q={pct(fit.nonlinearityPctFs)} />
      </ResultRow>
      <ResultRow label="Hysteresis">
        {fit.hysteresisPctFs === null ? (
          <span className="text-sm text-ink-soft">no shared up/down voltages</span>
        ) : (
          <Quantity q={pct(fit.hysteresisPctFs)} />
        )}
      </ResultRow>
      <ResultRow label="Points">
        <Quantity q={{ value: `n = ${fit.n}`, unit: '' }} />
      </ResultRow>
    </ResultPanel>
  );
}
