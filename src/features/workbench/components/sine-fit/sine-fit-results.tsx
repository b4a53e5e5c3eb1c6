import { formatPlusMinus, formatSig } from '@shared/format/measured-number.ts';
import { Gain, Headline, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import type { SineFitResult } from './use-sine-record.ts';

const pm = (value: number, u: number | null, unit: string) => formatPlusMinus(value, u, 'std', unit);

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
        <span className="num">{pm(r.phaseLagDeg, r.phaseLagStdUncDeg, '°')}</span>
      </ResultRow>
      <ResultRow label={r.frequencyKnown ? 'Frequency (given)' : 'Frequency (fitted)'}>
        <span className="num">{r.frequencyKnown ? `${formatSig(r.frequencyHz, 6)} Hz` : pm(r.frequencyHz, r.frequencyStdUncHz, 'Hz')}</span>
      </ResultRow>
      <ResultRow label="Drive amplitude" note={`Offset ${formatSig(r.voltsOffsetV)} V`}>
        <span className="num">{pm(r.voltsAmplitudeV, r.voltsAmplitudeStdUncV, 'V')}</span>
      </ResultRow>
      <ResultRow label="Displacement amplitude" note={`Offset ${formatSig(r.displacementOffsetNm)} nm`}>
        <span className="num">{pm(r.displacementAmplitudeNm, r.displacementAmplitudeStdUncNm, 'nm')}</span>
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
