import { FieldGroup, FormNumber } from '@/features/workbench/components/fields.tsx';
import { FormQuantity } from '@/features/workbench/components/quantity-field.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatFixed, formatSi, formatSig, type Formatted } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { capacitanceUnits, frequencyUnits } from '@/features/workbench/quantity-units.ts';
import { driveLimitsForm } from '@/features/workbench/simple/drive-limits-form.ts';
import { driveLimitsCalculator } from '@shared/workbench/calculators/drive-limits-calculator.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = { capacitance: 3.4, capacitanceUnit: 'nF', amplitudeV: 100, frequency: 1, frequencyUnit: 'kHz' } as const;

const slew = (vPerS: number | null): Formatted =>
  vPerS === null ? { value: '—', unit: 'V/µs' } : { value: formatSig(vPerS / 1e6, 3), unit: 'V/µs' };

export function DriveLimitsPage() {
  const { form, live } = useLiveForm(driveLimitsForm, defaults, driveLimitsCalculator.compute);
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="drive-limits"
      lead="What a sine drive or a triangle raster asks of the amplifier behind a piezo, and the frequencies its current limit, slew rate and output resistance allow."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Load and sine drive" note="Capacitance: measure it, or take one quadrant from the piezo tube page.">
              <FormQuantity form={form} name="capacitance" unitName="capacitanceUnit" label="Capacitance C" units={capacitanceUnits} />
              <FormNumber form={form} name="amplitudeV" label="Amplitude (peak)" unit="V" />
              <FormQuantity form={form} name="frequency" unitName="frequencyUnit" label="Frequency f" units={frequencyUnits} />
            </FieldGroup>
            <FieldGroup legend="Triangle raster" note="Enter both or neither. One line period covers trace and retrace.">
              <FormNumber form={form} name="rasterSwingPpV" label="Swing" unit="V p-p" optional />
              <FormNumber form={form} name="lineRateHz" label="Line rate" unit="Hz" optional />
            </FieldGroup>
            <FieldGroup legend="Amplifier" note="From its data sheet or a measurement; each one you enter sets a ceiling.">
              <FormNumber form={form} name="currentLimitMa" label="Current limit" unit="mA" optional />
              <FormNumber form={form} name="slewRateVPerUs" label="Slew rate" unit="V/µs" optional />
              <FormNumber
                form={form}
                name="outputResistanceOhm"
                label="Output resistance"
                unit="Ω"
                optional
                hint="Including any series resistor."
              />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <ResultNotesBlock r={r} />
              <ResultPanel
                headline={
                  <Headline label="Peak current of the sine" sub={`Slew rate ${slew(r.sineSlewRateVPerS).value} V/µs`}>
                    <Quantity q={formatSi(r.sinePeakCurrentA, 'A')} />
                  </Headline>
                }
                basis={
                  'Sine slew 2π·f·V, triangle slew 2·V_pp·f, current C·dV/dt, the ceilings those solved for f, and the corner ' +
                  '1/(2π·R·C) of a first-order low-pass: all calculated from the formulas.'
                }
              >
                {r.rasterSlewRateVPerS !== null && (
                  <>
                    <ResultRow label="Raster slew rate">
                      <Quantity q={slew(r.rasterSlewRateVPerS)} />
                    </ResultRow>
                    <ResultRow label="Raster current" note="Steady during each ramp, reversing at the turn.">
                      <Quantity q={formatSi(r.rasterCurrentA, 'A')} />
                    </ResultRow>
                  </>
                )}
                {r.currentLimitedMaxHz !== null && (
                  <ResultRow label="Highest sine frequency, current limit">
                    <Quantity q={formatSi(r.currentLimitedMaxHz, 'Hz')} />
                  </ResultRow>
                )}
                {r.slewLimitedMaxHz !== null && (
                  <ResultRow label="Highest sine frequency, slew rate">
                    <Quantity q={formatSi(r.slewLimitedMaxHz, 'Hz')} />
                  </ResultRow>
                )}
                {r.rasterCurrentLimitedLineRateHz !== null && (
                  <ResultRow label="Highest line rate, current limit">
                    <Quantity q={formatSi(r.rasterCurrentLimitedLineRateHz, 'Hz')} />
                  </ResultRow>
                )}
                {r.rasterSlewLimitedLineRateHz !== null && (
                  <ResultRow label="Highest line rate, slew rate">
                    <Quantity q={formatSi(r.rasterSlewLimitedLineRateHz, 'Hz')} />
                  </ResultRow>
                )}
                {r.rcCornerHz !== null && r.rcAmplitudeRatio !== null && (
                  <>
                    <ResultRow label="Corner of output resistance and load" note="Above it the piezo sees less than 71 % of the amplitude.">
                      <Quantity q={formatSi(r.rcCornerHz, 'Hz')} />
                    </ResultRow>
                    <ResultRow label="Amplitude left at f">
                      <Quantity q={{ value: formatFixed(r.rcAmplitudeRatio * 100, 1), unit: '%' }} />
                    </ResultRow>
                  </>
                )}
                <ResultRow label="Charge held at the highest voltage" note="Q = C·V, what the element keeps when the drive stops.">
                  <Quantity q={formatSi(r.storedChargeC, 'C')} />
                </ResultRow>
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
