import { FieldGroup, FormNumber } from '@/features/workbench/components/fields.tsx';
import { FormQuantity } from '@/features/workbench/components/quantity-field.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import { SafetyNotice } from '@/components/ui/safety-notice.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSi } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { capacitanceUnits, frequencyUnits } from '@/features/workbench/quantity-units.ts';
import { driveCurrentForm } from '@/features/workbench/simple/drive-current-form.ts';
import { driveCurrentCalculator } from '@shared/workbench/calculators/simple-calculators.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = { capacitance: 3.4, capacitanceUnit: 'nF', amplitudeV: 100, frequency: 1, frequencyUnit: 'kHz' } as const;

export function DriveCurrentPage() {
  const { form, live } = useLiveForm(driveCurrentForm, defaults, driveCurrentCalculator.compute);
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="drive-current"
      lead="A piezo is a capacitor: what a sine drive asks of the amplifier, and what the element keeps when it stops."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Load and drive" note="Capacitance: measure it, or take it from the part's registry entry.">
              <FormQuantity form={form} name="capacitance" unitName="capacitanceUnit" label="Capacitance C" units={capacitanceUnits} />
              <FormNumber form={form} name="amplitudeV" label="Amplitude (peak)" unit="V" />
              <FormQuantity
                form={form}
                name="frequency"
                unitName="frequencyUnit"
                label="Frequency f"
                units={frequencyUnits}
                hint="0 for a DC hold."
              />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <SafetyNotice cautions={r.cautions} crossed={r.levelsCrossed} />
              <ResultPanel
                headline={
                  <Headline label="Peak current">
                    <Quantity q={formatSi(r.peakCurrentA, 'A')} />
                  </Headline>
                }
                basis={
                  'A sine of peak V at f into a capacitance C: I_pk = 2π·f·C·V, I_rms = I_pk/√2, reactive power V_rms·I_rms; ' +
                  'charge Q = C·V and energy ½CV² (calculated from the formula). Cautions at the IEC 61010-1 levels: 30 V rms, ' +
                  '42.4 V peak, 60 V DC, 45 µC.'
                }
              >
                <ResultRow label="RMS current">
                  <Quantity q={formatSi(r.rmsCurrentA, 'A')} />
                </ResultRow>
                <ResultRow label="RMS voltage">
                  <Quantity q={formatSi(r.rmsVoltageV, 'V')} />
                </ResultRow>
                <ResultRow label="Reactive power" note="Circulates between amplifier and load; the amplifier must source and sink it.">
                  <Quantity q={formatSi(r.reactivePowerVar, 'var')} />
                </ResultRow>
                <ResultRow label="Stored charge at the amplitude">
                  <Quantity q={formatSi(r.storedChargeC, 'C')} />
                </ResultRow>
                <ResultRow label="Stored energy at the amplitude">
                  <Quantity q={formatSi(r.storedEnergyJ, 'J')} />
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
