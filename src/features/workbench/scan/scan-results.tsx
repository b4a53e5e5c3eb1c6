import { Notice } from '@/components/ui/notice.tsx';
import { formatDuration, formatLengthNm, formatSi, formatSig } from '../format.ts';
import { Headline, Quantity, ResultPanel, ResultRow } from '../components/results.tsx';
import type { ScanResult } from './scan-form.ts';

/** Step, range, timing and line-rate ceilings of a scan plan. */
export function ScanResults({ r }: { r: ScanResult }) {
  const { plan } = r;
  const overRange = plan.scanSizeNm !== undefined && plan.scanSizeNm > r.rangeNm;
  const overCeiling = r.ceilings !== null && plan.lineRateHz > r.ceilings.sineLikeHz;
  return (
    <>
      {overRange && <Notice tone="caution" title="Scan size beyond the range">The scan size is larger than the drive chain can reach ({formatLengthNm(r.rangeNm).value} {formatLengthNm(r.rangeNm).unit}).</Notice>}
      {overCeiling && <Notice tone="caution" title="Line rate above the ceiling">The line rate is above f₀/10; expect ringing and a distorted image.</Notice>}
      <ResultPanel
        headline={<Headline label={`Smallest step at ${plan.dacBits} bit`} sub="One DAC count, through the amplifier and the actuator."><Quantity q={formatLengthNm(r.lsbNm)} /></Headline>}
        basis="LSB = actuator gain × amplifier gain × DAC span / 2ᴺ, bits N ≥ log₂(range/step) [practice]; ceilings f₀/10 for sine-like scans [practice] and f₀/100 for sharp triangles (Bae & Granick, Rev. Sci. Instrum. 71, 3955, 2000)."
      >
        <ResultRow label="Amplifier output span"><Quantity q={formatSi(r.outputSpanV, 'V', 4, ['m', 'k'])} /></ResultRow>
        <ResultRow label="Full range"><Quantity q={formatLengthNm(r.rangeNm)} /></ResultRow>
        {r.bitsNeeded !== null && <ResultRow label="Bits for the wanted step"><Quantity q={{ value: String(r.bitsNeeded), unit: 'bit' }} /></ResultRow>}
        {r.pixelNm !== null && (
          <ResultRow label="Pixel size" note={`${formatSig(r.pixelNm / r.lsbNm, 3)} DAC steps per pixel.`}><Quantity q={formatLengthNm(r.pixelNm)} /></ResultRow>
        )}
        <ResultRow label="Frame time" note="Line rate counts trace and retrace together."><Quantity q={formatDuration(r.frameTimeS)} /></ResultRow>
        <ResultRow label="Time per pixel (trace)"><Quantity q={formatDuration(r.pixelTimeS)} /></ResultRow>
        {r.tipSpeedNmPerS !== null && <ResultRow label="Tip speed"><Quantity q={{ ...formatLengthNm(r.tipSpeedNmPerS), unit: `${formatLengthNm(r.tipSpeedNmPerS).unit}/s` }} /></ResultRow>}
        {r.ceilings && (
          <>
            <ResultRow label="Line-rate ceiling, sine-like scan"><Quantity q={formatSi(r.ceilings.sineLikeHz, 'Hz')} /></ResultRow>
            <ResultRow label="Line-rate ceiling, triangular raster"><Quantity q={formatSi(r.ceilings.triangleHz, 'Hz')} /></ResultRow>
          </>
        )}
        {r.gainErrorPct !== null && (
          <ResultRow label="Gain error at the line rate" note="Quasi-static, lightly damped 2nd-order actuator: 1/(1 − (f/f₀)²) − 1 [calc].">
            <Quantity q={{ value: `+${formatSig(r.gainErrorPct, 3)}`, unit: '%' }} />
          </ResultRow>
        )}
      </ResultPanel>
    </>
  );
}
