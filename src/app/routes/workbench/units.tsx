import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { NoResult, Quantity, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { computeUnits, unitsForm } from '@/features/workbench/simple/units-form.ts';
import { displacementOptions, gainOptions, voltageOptions } from '@/features/workbench/unit-options.ts';
import { ToolInputs } from './tool-inputs.tsx';

export function UnitsPage() {
  const { form, live } = useLiveForm(
    unitsForm,
    { length: { value: 1, from: 'mil' }, voltage: { value: 250, from: 'mV' }, gain: { value: 1, from: 'uin/V' } },
    computeUnits,
  );
  return (
    <ToolPage
      slug="units"
      lead="Dial indicators read in µm or mil, datasheets in µin, lattices in Å: convert displacements, voltages and gains."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Displacement">
              <FormNumber form={form} name="length.value" label="Value" />
              <FormSelect form={form} name="length.from" label="Unit" options={displacementOptions} />
            </FieldGroup>
            <FieldGroup legend="Voltage">
              <FormNumber form={form} name="voltage.value" label="Value" />
              <FormSelect form={form} name="voltage.from" label="Unit" options={voltageOptions} />
            </FieldGroup>
            <FieldGroup legend="Gain">
              <FormNumber form={form} name="gain.value" label="Value" />
              <FormSelect form={form} name="gain.from" label="Unit" options={gainOptions} />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          live.ok ? (
            <>
              <ResultPanel
                title="Displacement"
                basis="1 in = 25.4 mm exactly (Source: NBS Circular 572 addendum, 1960), so 1 µin = 25.4 nm and 1 mil = 25.4 µm; 1 Å = 0.1 nm."
              >
                {live.result.lengths.map((l) => (
                  <ResultRow key={l.unit} label={`in ${l.label}`}>
                    <Quantity q={{ value: formatSig(l.value, 6), unit: l.label }} />
                  </ResultRow>
                ))}
              </ResultPanel>
              <ResultPanel title="Voltage">
                {live.result.voltages.map((v) => (
                  <ResultRow key={v.unit} label={`in ${v.label}`}>
                    <Quantity q={{ value: formatSig(v.value, 6), unit: v.label }} />
                  </ResultRow>
                ))}
              </ResultPanel>
              <ResultPanel
                title="Gain"
                basis="The volt is common to every gain unit, so a gain converts as its length does: 1 µin/V = 25.4 nm/V, 1 Å/V = 0.1 nm/V."
              >
                {live.result.gains.map((g) => (
                  <ResultRow key={g.unit} label={`in ${g.label}`}>
                    <Quantity q={{ value: formatSig(g.value, 6), unit: g.label }} />
                  </ResultRow>
                ))}
              </ResultPanel>
            </>
          ) : (
            <NoResult message={live.message} />
          )
        }
      />
    </ToolPage>
  );
}
