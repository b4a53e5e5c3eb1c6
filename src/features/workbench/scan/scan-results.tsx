import { formatDuration, formatLengthNm, formatSi, formatSig } from '@shared/format/measured-number.ts';
import { Headline, Quantity, ResultPanel, ResultRow, ResultWarnings } from '../components/results.tsx';
import type { CalculatorResult } from '@shared/workbench/calculators/calculator.ts';
import type { scanPlanCalculator } from '@shared/workbench/calculators/scan-plan-calculator.ts';
import type { ScanPlan } from './scan-form.ts';

/** What the shared scan-plan calculator returns. */
export type ScanResult = CalculatorResult<typeof scanPlanCalculator>;

/** Step, range, timing and line-rate ceilings of a scan plan. */
export function ScanResults({ r, plan }: { r: ScanResult; plan: ScanPlan }) {
  return (
    <>
      <ResultWarnings warnings={r.warnings} />
      <ResultPanel
        headline={
          <Headline label={`Smallest step at ${plan.dacBits} bit`} sub="One DAC count, through the amplifier and the actuator.">
            <Quantity q={formatLengthNm(r.lsbNm)} />
          </Headline>
        }
        basis={
          'LSB = actuator gain × amplifier gain × DAC span / 2ᴺ, bits N ≥ log₂(range/step) (common practice); ceilings ' +
          'f₀/10 for sine-like scans (common practice) and f₀/100 for sharp triangles (Source: Bae & Granick, Rev. Sci. ' +
          'Instrum. 71, 3955, 2000).'
        }
      >
        <ResultRow label="Amplifier output span">
          <Quantity q={formatSi(r.outputSpanV, 'V', 4, ['m', 'k'])} />
        </ResultRow>
        <ResultRow label="Full range">
          <Quantity q={formatLengthNm(r.rangeNm)} />
        </ResultRow>
        {r.bitsNeeded !== null && (
          <ResultRow label="Bits for the wanted step">
            <Quantity q={{ value: String(r.bitsNeeded), unit: 'bit' }} />
          </ResultRow>
        )}
        {r.pixelNm !== null && (
          <ResultRow label="Pixel size" note={`${formatSig(r.pixelNm / r.lsbNm, 3)} DAC steps per pixel.`}>
            <Quantity q={formatLengthNm(r.pixelNm)} />
          </ResultRow>
        )}
        <ResultRow label="Frame time" note="Line rate counts trace and retrace together.">
          <Quantity q={formatDuration(r.frameTimeS)} />
        </ResultRow>
        <ResultRow label="Time per pixel (trace)">
          <Quantity q={formatDuration(r.pixelTimeS)} />
        </ResultRow>
        {r.tipSpeedNmPerS !== null && (
          <ResultRow label="Tip speed">
            <Quantity q={{ ...formatLengthNm(r.tipSpeedNmPerS), unit: `${formatLengthNm(r.tipSpeedNmPerS).unit}/s` }} />
          </ResultRow>
        )}
        {r.lineRateCeilingSineLikeHz !== null && r.lineRateCeilingTriangleHz !== null && (
          <>
            <ResultRow label="Line-rate ceiling, sine-like scan">
              <Quantity q={formatSi(r.lineRateCeilingSineLikeHz, 'Hz')} />
            </ResultRow>
            <ResultRow label="Line-rate ceiling, triangular raster">
              <Quantity q={formatSi(r.lineRateCeilingTriangleHz, 'Hz')} />
            </ResultRow>
          </>
        )}
        {r.gainErrorAtLineRatePct !== null && (
          <ResultRow
            label="Gain error at the line rate"
            note="Quasi-static, lightly damped 2nd-order actuator: 1/(1 − (f/f₀)²) − 1 (calculated from the formula)."
          >
            <Quantity q={{ value: `+${formatSig(r.gainErrorAtLineRatePct, 3)}`, unit: '%' }} />
          </ResultRow>
        )}
      </ResultPanel>
    </>
  );
}
