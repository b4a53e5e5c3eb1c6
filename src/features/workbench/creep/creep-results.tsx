import type { CalculatorResult } from '@shared/workbench/calculators/calculator.ts';
import type { creepCalculator } from '@shared/workbench/calculators/creep-calculator.ts';
import { formatLengthNm, formatR2, formatSig, formatTimeLabel } from '@shared/format/measured-number.ts';
import { Headline, Quantity, ResultPanel, ResultRow, ResultWarnings } from '../components/results.tsx';

/** γ, x(0.1 s), the fit quality, and creep projected to later times. */
export function CreepResults({
  fit,
  projections,
}: {
  fit: CalculatorResult<typeof creepCalculator>;
  projections: readonly { timeS: number; pct: number }[];
}) {
  return (
    <>
      <ResultWarnings warnings={fit.warnings} />
      <ResultPanel
        headline={
          <Headline label="Creep factor γ" sub="Fraction added per decade of time after the step.">
            <span className="num">{formatSig(fit.gamma, 3)}</span>
          </Headline>
        }
        basis="x(t) = x(0.1 s)·[1 + γ·log₁₀(t / 0.1 s)], γ ≈ 0.01–0.02 for open-loop PZT (Source: PI catalogue 1998–2006); fitted by least squares against log₁₀ t."
      >
        <ResultRow label="x at 0.1 s">
          <Quantity q={formatLengthNm(fit.displacementAt0p1sNm)} />
        </ResultRow>
        {projections.map((p) => (
          <ResultRow key={p.timeS} label={`Creep by ${formatTimeLabel(p.timeS)}`}>
            <Quantity q={{ value: `${p.pct >= 0 ? '+' : ''}${formatSig(p.pct, 3)}`, unit: '%' }} />
          </ResultRow>
        ))}
        <ResultRow label="Residual SD">
          <Quantity q={formatLengthNm(fit.residualStdNm)} />
        </ResultRow>
        <ResultRow label="R²">
          <Quantity q={{ value: formatR2(fit.r2), unit: '' }} />
        </ResultRow>
        <ResultRow label="Samples">
          <Quantity q={{ value: `n = ${fit.n}`, unit: '' }} />
        </ResultRow>
      </ResultPanel>
    </>
  );
}
