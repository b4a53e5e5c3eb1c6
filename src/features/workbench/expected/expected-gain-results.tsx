import type { ExpectedGain } from '@shared/workbench/expected-gain.ts';
import { formatSig } from '../format.ts';
import { Gain, Headline, Quantity, ResultPanel, ResultRow } from '../components/results.tsx';

interface Result extends ExpectedGain {
  comparison: { ratio: number; withinBand: boolean } | null;
  basis: string;
}

/** Expected gain, its ±20 % band, and how a measurement compares. */
export function ExpectedGainResults({ r, materialSource }: { r: Result; materialSource: string }) {
  const verdict = r.comparison && (r.comparison.withinBand ? 'inside the band' : r.comparison.ratio < 1 ? 'below the band' : 'above the band');
  return (
    <ResultPanel
      headline={
        <Headline label="Expected gain (free, unloaded)" sub={<>Band <span className="num">{formatSig(r.lowNmPerV)} – {formatSig(r.highNmPerV)}</span> nm/V: ±20 % for the material family.</>}>
          <Gain value={r.gainNmPerV} />
        </Headline>
      }
      basis={<>{r.basis} Material: {materialSource}. Real parts under load give less; always measure.</>}
    >
      {r.comparison && (
        <ResultRow label="Measured ÷ expected" note={`The measurement is ${verdict}. Well below usually means preload, a stiff mount, glue, or a different ceramic.`}>
          <Quantity q={{ value: formatSig(r.comparison.ratio, 3), unit: '' }} />
        </ResultRow>
      )}
    </ResultPanel>
  );
}
