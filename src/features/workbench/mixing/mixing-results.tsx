import { formatSi, formatSig } from '@shared/format/measured-number.ts';
import { Headline, Quantity, ResultPanel, ResultRow } from '../components/results.tsx';
import type { MixingResult } from './mixing-form.ts';

const volts = (v: number) => formatSi(v, 'V', 4, ['m', 'k']);

function outOfReach(r: MixingResult): string[] {
  const t = r.target;
  if (!t) return [];
  const l = r.limits;
  return [
    t.vaV < l.vaMinV ? `Va would be below its minimum (${formatSig(l.vaMinV)} V)` : null,
    t.vaV > l.vaMaxV ? `Va would be above its maximum (${formatSig(l.vaMaxV)} V)` : null,
    t.vbV < l.vbMinV ? `Vb would be below its minimum (${formatSig(l.vbMinV)} V)` : null,
    t.vbV > l.vbMaxV ? `Vb would be above its maximum (${formatSig(l.vbMaxV)} V)` : null,
  ].filter((s): s is string => s !== null);
}

/** Drive voltages for the wanted point, reachability, G⁻¹ and how close to parallel the actuators are. */
export function MixingResults({ r }: { r: MixingResult }) {
  const t = r.target;
  const reasons = outOfReach(r);
  return (
    <ResultPanel
      headline={
        t ? (
          <Headline
            label="Drive for the wanted point"
            sub={t.reachable ? 'Reachable within the drive limits.' : `Out of reach: ${reasons.join('; ')}.`}
          >
            <span className="flex flex-wrap gap-x-4">
              <span>
                Va <Quantity q={volts(t.vaV)} />
              </span>
              <span>
                Vb <Quantity q={volts(t.vbV)} />
              </span>
            </span>
          </Headline>
        ) : (
          <p className="text-sm text-ink-soft">Enter a wanted x and y to get the drive voltages for it.</p>
        )
      }
      basis="r = G·[Va, Vb]ᵀ and [Va, Vb]ᵀ = G⁻¹·r; the reachable region is the drive-limit rectangle mapped through G (common practice; small-angle, linear)."
    >
      {t && (
        <ResultRow label="Reachable">
          <span className={t.reachable ? 'font-semibold text-teal-dark' : 'font-semibold text-danger'}>{t.reachable ? 'yes' : 'no'}</span>
        </ResultRow>
      )}
      <ResultRow label="G⁻¹, row Va" note="Volts per nm of x and of y.">
        <Quantity q={{ value: `${formatSig(r.inverseVPerNm[0][0] * 1000)}, ${formatSig(r.inverseVPerNm[0][1] * 1000)}`, unit: 'mV/nm' }} />
      </ResultRow>
      <ResultRow label="G⁻¹, row Vb">
        <Quantity q={{ value: `${formatSig(r.inverseVPerNm[1][0] * 1000)}, ${formatSig(r.inverseVPerNm[1][1] * 1000)}`, unit: 'mV/nm' }} />
      </ResultRow>
      <ResultRow
        label="|sin θ| between the actuators"
        note={
          r.sinAngle < 0.5 ? 'Nearly parallel: small moves across need large, opposing voltages.' : '1 at right angles, 0 when parallel.'
        }
      >
        <Quantity q={{ value: formatSig(r.sinAngle, 3), unit: '' }} />
      </ResultRow>
    </ResultPanel>
  );
}
