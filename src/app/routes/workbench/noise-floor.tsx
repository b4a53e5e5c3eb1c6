import { FieldGroup, FormNumber } from '@/features/workbench/components/fields.tsx';
import { FormQuantity } from '@/features/workbench/components/quantity-field.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatFixed, formatLengthNm } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { frequencyUnits } from '@/features/workbench/quantity-units.ts';
import { noiseFloorForm } from '@/features/workbench/scan/noise-floor-form.ts';
import { noiseFloorCalculator, type NoiseSource } from '@shared/workbench/calculators/noise-floor-calculator.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = {
  actuatorGainNmPerV: 102.6,
  ampGainVPerV: 30,
  noiseDensityNvPerRtHz: 100,
  bandwidth: 10,
  bandwidthUnit: 'kHz',
  dacBits: 16,
  dacSpanV: 10,
  cantileverStiffnessNPerM: 0.1,
  temperatureK: 295,
} as const;

const sourceLabels: Record<NoiseSource, { label: string; note: string }> = {
  amplifier: { label: 'Amplifier noise', note: 'e_n·√B × amplifier gain × actuator gain, white noise assumed (calculated).' },
  dac: { label: 'DAC quantisation', note: 'One step ÷ √12 (Source: Bennett, Bell Syst. Tech. J. 27, 446, 1948).' },
  thermal: { label: 'Cantilever thermal motion', note: '√(k_B·T/k) (Source: the equipartition theorem; k_B exact in the 2019 SI).' },
};

export function NoiseFloorPage() {
  const { form, live } = useLiveForm(noiseFloorForm, defaults, noiseFloorCalculator.compute);
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="noise-floor"
      lead="How much the tip moves, or seems to, with nothing commanded: amplifier noise, DAC steps and the lever's thermal motion, added up."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Actuator and amplifier">
              <FormNumber form={form} name="actuatorGainNmPerV" label="Actuator gain" unit="nm/V" hint="From a calibration run." />
              <FormNumber
                form={form}
                name="ampGainVPerV"
                label="Amplifier gain"
                unit="V/V"
                optional
                hint="1 if the DAC drives the actuator directly."
              />
              <FormNumber
                form={form}
                name="noiseDensityNvPerRtHz"
                label="Input noise density e_n"
                unit="nV/√Hz"
                optional
                hint="Referred to the amplifier's input."
              />
              <FormQuantity
                form={form}
                name="bandwidth"
                unitName="bandwidthUnit"
                label="Noise bandwidth B"
                units={frequencyUnits}
                optional
                hint="For a single-pole roll-off about 1.57 × its corner (recalled value, not yet checked against a source)."
              />
            </FieldGroup>
            <FieldGroup legend="DAC" note="Both or neither; uses the amplifier gain.">
              <FormNumber form={form} name="dacBits" label="Resolution" unit="bits" optional step="1" />
              <FormNumber form={form} name="dacSpanV" label="Output span" unit="V" optional />
            </FieldGroup>
            <FieldGroup legend="Cantilever">
              <FormNumber form={form} name="cantileverStiffnessNPerM" label="Spring constant k" unit="N/m" optional />
              <FormNumber form={form} name="temperatureK" label="Temperature T" unit="K" optional hint="295 K is room temperature." />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <ResultNotesBlock r={r} />
              <ResultPanel
                headline={
                  <Headline
                    label="Noise at the tip (rms)"
                    sub={`${sourceLabels[r.dominant].label} dominates: ${formatFixed(r.dominantPowerSharePct, 0)} % of the noise power.`}
                  >
                    <Quantity q={formatLengthNm(r.totalNoiseNm)} />
                  </Headline>
                }
                basis="Independent sources add in power: total = √(Σ xᵢ²) (calculated)."
              >
                {r.terms.map((t) => (
                  <ResultRow
                    key={t.source}
                    label={sourceLabels[t.source].label}
                    note={`${sourceLabels[t.source].note} ${formatFixed(t.powerSharePct, 1)} % of the noise power.`}
                  >
                    <Quantity q={formatLengthNm(t.noiseNm)} />
                  </ResultRow>
                ))}
                {r.dacLsbNm !== null && (
                  <ResultRow label="DAC step at the tip" note="Actuator gain × amplifier gain × span ÷ 2ᴺ (common practice).">
                    <Quantity q={formatLengthNm(r.dacLsbNm)} />
                  </ResultRow>
                )}
              </ResultPanel>
            </>
          ) : (
            <NoResult message={live.ok ? '' : live.message} />
          )
        }
      />
    </ToolPage>
  );
}
