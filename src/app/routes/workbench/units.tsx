import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { NoResult, Quantity, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSig } from '@/features/workbench/format.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { computeUnits, unitsForm } from '@/features/workbench/simple/units-form.ts';
import { displacementOptions, voltageOptions } from '@/features/workbench/unit-options.ts';

export function UnitsPage() {
  const { form, live } = useLiveForm(unitsForm, { length: { value: 1, from: 'mil' }, voltage: { value: 250, unit: 'mV' } }, computeUnits);
  return (
    <ToolPage slug="units" lead="Dial indicators read in µm or mil, datasheets in µin, lattices in Å: convert between them and nm.">
      <ToolColumns
        inputs={
          <form noValidate onSubmit={(e) => e.preventDefault()} className="space-y-4">
            <FieldGroup legend="Displacement">
              <FormNumber form={form} name="length.value" label="Value" />
              <FormSelect form={form} name="length.from" label="Unit" options={displacementOptions} />
            </FieldGroup>
            <FieldGroup legend="Voltage">
              <FormNumber form={form} name="voltage.value" label="Value" />
              <FormSelect form={form} name="voltage.unit" label="Unit" options={voltageOptions} />
            </FieldGroup>
          </form>
        }
        results={
          live.ok ? (
            <>
              <ResultPanel title="Displacement" basis="1 in = 25.4 mm exactly (NBS Circular 572 addendum, 1960), so 1 µin = 25.4 nm and 1 mil = 25.4 µm; 1 Å = 0.1 nm.">
                {live.result.lengths.map((l) => (
                  <ResultRow key={l.unit} label={`in ${l.unit}`}><Quantity q={{ value: formatSig(l.value, 6), unit: l.unit }} /></ResultRow>
                ))}
              </ResultPanel>
              <ResultPanel title="Voltage">
                {live.result.voltages.map((v) => (
                  <ResultRow key={v.unit} label={`in ${v.unit}`}><Quantity q={{ value: formatSig(v.value, 6), unit: v.unit }} /></ResultRow>
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
