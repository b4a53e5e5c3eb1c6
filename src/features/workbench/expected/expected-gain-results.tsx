import type { CalculatorResult } from '@shared/workbench/calculators/calculator.ts';
import type { expectedGainCalculator } from '@shared/workbench/calculators/expected-gain-calculator.ts';
import { formatSig } from '@shared/format/measured-number.ts';
import { Gain, Headline, Quantity, ResultPanel, ResultRow } from '../components/results.tsx';

type Result = CalculatorResult<typeof expectedGainCalculator>;

/** Expected gain, its ±20 % band, and how a measurement compares. */
export function ExpectedGainResults({ r, materialSource }: { r: Result; materialSource: string }) {
  const verdict =
    r.comparison && (r.comparison.withinBand ? 'inside the band' : r.comparison.ratio < 1 ? 'below the band' : 'above the band');
  return (
    <ResultPanel
      headline={
        <Headline
          label="Expected gain (free, unloaded)"
          sub={
            <>
              Band{' '}
              <span className="num">
                {formatSig(r.lowNmPerV)} – {formatSig(r.highNmPerV)}
              </span>{' '}
              nm/V: ±20 % for the material family.
            </>
          }
        >
          <Gain value={r.gainNmPerV} />
        </Headline>
      }
      basis={
        <>
          {r.basis} Material constants — {materialSource}. Real parts under load give less; always measure.
        </>
      }
    >
      {r.tolerance && (
        <ResultRow
          label="Band from the geometry tolerances"
          note={
            <>
              ± 2 standard uncertainties (k = 2) from the tolerances alone;{' '}
              {r.tolerance.contributions.map((c) => `${c.field.replace('Mm', '')} ${formatSig(c.relStdUnc * 100, 2)} %`).join(', ')} (u, k =
              1, each).
            </>
          }
        >
          <span className="whitespace-nowrap">
            <span className="num">
              {formatSig(r.tolerance.lowNmPerV)} – {formatSig(r.tolerance.highNmPerV)}
            </span>{' '}
            nm/V
          </span>
        </ResultRow>
      )}
      {r.comparison && (
        <ResultRow
          label="Measured ÷ expected"
          note={`The measurement is ${verdict}. Well below usually means preload, a stiff mount, glue, or a different ceramic.`}
        >
          <Quantity q={{ value: formatSig(r.comparison.ratio, 3), unit: '' }} />
        </ResultRow>
      )}
    </ResultPanel>
  );
}
