import { formatSig, formatWithUncertainty } from '@shared/format/measured-number.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';
import { Gain, Headline, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import type { SineFitResult } from './use-sine-record.ts';

/** A value ± its standard uncertainty and unit, the label on its own so a narrow screen can wrap before it. */
function Measured({ value, u, unit }: { value: number; u: number | null; unit: string }) {
  const f = formatWithUncertainty(value, u);
  return (
    <>
      <span className="num whitespace-nowrap">
        {f.value}
        {f.uncertainty && ` ± ${f.uncertainty}`}
        {unit === '°' ? unit : ` ${unit}`}
      </span>
      {f.uncertainty && (
        <>
          {' '}
          <PlusMinusLabel kind="std" className="whitespace-nowrap text-xs" />
        </>
      )}
    </>
  );
}

/** Gain ± u, phase lag, frequency, amplitudes, residual SDs and the record's extent. */
export function SineFitResults({ r }: { r: SineFitResult }) {
  return (
    <ResultPanel
      headline={
        <Headline
          label="Gain"
          sub="Displacement amplitude ÷ drive amplitude; ± standard uncertainty (k = 1, GUM) from the fit's residuals."
        >
          <Gain value={r.gainNmPerV} plusMinus={r.gainStdUncNmPerV} kind="std" />
        </Headline>
      }
      basis={
        'Each channel fitted with A·cos ωt + B·sin ωt + C by least squares; the frequency is given, or refined from the drive by the ' +
        'four-parameter iteration (Source: IEEE Std 1057-2017, sine-fit algorithms). Uncertainties from the fit covariance ' +
        '(Source: GUM, JCGM 100:2008, 5.1.2).'
      }
    >
      <ResultRow label="Phase lag of displacement behind drive" note="Positive: the displacement follows the drive late; the loop's width.">
        <Measured value={r.phaseLagDeg} u={r.phaseLagStdUncDeg} unit="°" />
      </ResultRow>
      <ResultRow label={r.frequencyKnown ? 'Frequency (given)' : 'Frequency (fitted)'}>
        {r.frequencyKnown ? (
          <span className="num">{formatSig(r.frequencyHz, 6)} Hz</span>
        ) : (
          <Measured value={r.frequencyHz} u={r.frequencyStdUncHz} unit="Hz" />
        )}
      </ResultRow>
      <ResultRow label="Drive amplitude" note={`Offset ${formatSig(r.voltsOffsetV)} V`}>
        <Measured value={r.voltsAmplitudeV} u={r.voltsAmplitudeStdUncV} unit="V" />
      </ResultRow>
      <ResultRow label="Displacement amplitude" note={`Offset ${formatSig(r.displacementOffsetNm)} nm`}>
        <Measured value={r.displacementAmplitudeNm} u={r.displacementAmplitudeStdUncNm} unit="nm" />
      </ResultRow>
      <ResultRow
        label="Residual SD"
        note={`Drive: ${formatSig(r.voltsResidualStdV, 3)} V; the sine explains ${formatSig(r.voltsExplainedFraction * 100, 4)} % of it.`}
      >
        <span className="num">{formatSig(r.residualStdNm, 3)} nm</span>
      </ResultRow>
      <ResultRow label="Record" note={r.frequencyKnown ? undefined : `${r.iterations} Gauss–Newton steps.`}>
        <span className="num">
          {formatSig(r.periods, 3)} periods, {r.n} samples
        </span>
      </ResultRow>
    </ResultPanel>
  );
}
