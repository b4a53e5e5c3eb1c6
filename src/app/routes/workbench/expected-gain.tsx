import { materials, type MaterialKey } from '@shared/workbench/materials.ts';
import { FieldGroup, FormNumber, FormSelect } from '@/features/workbench/components/fields.tsx';
import { NoResult } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { actuatorKinds, kindOf } from '@/features/workbench/expected/actuator-kinds.ts';
import { expectedGainForm } from '@/features/workbench/expected/expected-gain-form.ts';
import { expectedGainCalculator } from '@shared/workbench/calculators/expected-gain-calculator.ts';
import { sourceInWords } from '@shared/workbench/source-words.ts';
import { ExpectedGainResults } from '@/features/workbench/expected/expected-gain-results.tsx';
import { MaterialFields } from '@/features/workbench/expected/material-fields.tsx';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = {
  spec: { actuator: 'bimorph-series', lengthMm: 12, thicknessMm: 0.6, outerDiameterMm: 6.35, wallMm: 0.508, layers: 200, plates: 1 },
  materialKey: 'PZT-5A',
  custom: {},
  tolerances: {},
} as const;

export function ExpectedGainPage() {
  const { form, live } = useLiveForm(expectedGainForm, defaults, expectedGainCalculator.compute);
  const kind = kindOf(form.watch('spec.actuator'));
  const materialKey = form.watch('materialKey');
  const source = materialKey === 'custom' ? 'your own constants' : sourceInWords(materials[materialKey as MaterialKey].source);
  return (
    <ToolPage
      slug="expected-gain"
      lead="What a bender, tube, stack or shear plate should give per volt, from its geometry and material: a sanity check for a measured gain."
    >
      <ToolColumns
        inputs={
          <ToolInputs start="expected-gain">
            <FieldGroup legend="Actuator">
              <div className="sm:col-span-2">
                <FormSelect form={form} name="spec.actuator" label="Kind" options={actuatorKinds} />
              </div>
              {kind.fields.map((f) => (
                <FormNumber
                  key={`${kind.value}-${f.name}`}
                  form={form}
                  name={`spec.${f.name}`}
                  label={f.label}
                  unit={f.unit}
                  optional={f.optional}
                  step={f.unit ? 'any' : '1'}
                />
              ))}
              {kind.fields.length === 0 && (
                <p className="text-sm text-ink-soft sm:col-span-2">No geometry needed: the gain is the same for any thickness.</p>
              )}
            </FieldGroup>
            {kind.fields.some((f) => f.unit === 'mm') && (
              <FieldGroup
                legend="Geometry tolerances"
                note={
                  '± how far each dimension may be off (a caliper reading, a datasheet tolerance); read as a rectangular spread ' +
                  'and combined to first order (Source: GUM, JCGM 100:2008, 4.3.7 and 5.1.2).'
                }
              >
                {kind.fields
                  .filter((f) => f.unit === 'mm')
                  .map((f) => (
                    <FormNumber
                      key={`${kind.value}-tol-${f.name}`}
                      form={form}
                      name={`tolerances.${f.name}` as 'tolerances.lengthMm'}
                      label={`± ${f.label}`}
                      unit="mm"
                      optional
                    />
                  ))}
              </FieldGroup>
            )}
            <MaterialFields form={form} needed={kind.constant} />
            <FieldGroup legend="Your measurement">
              <FormNumber
                form={form}
                name="measuredNmPerV"
                label="Measured gain"
                unit="nm/V"
                optional
                hint="From a gain fit; compares it with the expectation."
              />
            </FieldGroup>
          </ToolInputs>
        }
        results={live.ok ? <ExpectedGainResults r={live.result} materialSource={source} /> : <NoResult message={live.message} />}
      />
    </ToolPage>
  );
}
