import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { FieldGroup, FormNumber, SelectInput } from '@/features/workbench/components/fields.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultWarnings } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { tubeForm, tubePresets } from '@/features/workbench/expected/tube-form.ts';
import { formatSi, formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { usePresetField } from '@/features/workbench/form/use-preset.ts';
import { tubeCalculator } from '@shared/workbench/calculators/tube-calculator.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = {
  preset: 'PZT-5H',
  lengthMm: 12.7,
  outerDiameterMm: 6.35,
  wallMm: 0.508,
  relPermittivity: 3400,
  youngsModulusGpa: 60.6,
  densityKgPerM3: 7500,
} as const;

export function TubePage() {
  const { form, live } = useLiveForm(tubeForm, defaults, tubeCalculator.compute);
  const { registration: presetField, preset } = usePresetField(form, tubePresets, (p) => ({
    relPermittivity: p.relPermittivity,
    youngsModulusGpa: p.eGpa,
    densityKgPerM3: p.rho,
  }));
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="tube"
      lead="A quartered piezo tube: the capacitance each quadrant puts on the amplifier, and the first bending and axial resonances of the tube clamped at one end."
    >
      <ToolColumns
        inputs={
          <ToolInputs start="tube">
            <FieldGroup legend="Tube (clamped at one end)">
              <FormNumber form={form} name="lengthMm" label="Free length L" unit="mm" />
              <FormNumber form={form} name="outerDiameterMm" label="Outer diameter" unit="mm" />
              <FormNumber form={form} name="wallMm" label="Wall" unit="mm" hint="Must leave a bore: less than half the outer diameter." />
            </FieldGroup>
            <FieldGroup legend="Material">
              <div className="sm:col-span-2">
                <SelectInput label="Preset" registration={presetField} options={tubePresets} hint={preset?.source ?? 'your own values'} />
              </div>
              <FormNumber form={form} name="relPermittivity" label="Relative permittivity εr" unit="ε33T/ε0" />
              <FormNumber form={form} name="youngsModulusGpa" label="Young's modulus E" unit="GPa" />
              <FormNumber form={form} name="densityKgPerM3" label="Density ρ" unit="kg/m³" />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <ResultWarnings warnings={r.warnings} />
              <ResultPanel
                headline={
                  <Headline label="Capacitance of one quadrant">
                    <Quantity q={formatSi(r.quadrantCapacitanceF, 'F')} />
                  </Headline>
                }
                basis={
                  'Coaxial capacitance C = 2π·ε0·εr·L/ln(OD/ID): recalled formula, not yet checked against a source; a quadrant ' +
                  'is a quarter of it, the gaps between electrodes neglected (calculated). Bending: Euler–Bernoulli cantilever f₁ ' +
                  '= (1.8751²/2π)·√(EI/ρAL⁴) with I = π(OD⁴−ID⁴)/64, A = π(OD²−ID²)/4 (Source: Rao, Mechanical Vibrations; ' +
                  'Timoshenko). Axial: f = (1/4L)·√(E/ρ) for a rod clamped at one end (Source: Rao, Mechanical Vibrations; ' +
                  'equation number recalled, not yet checked).'
                }
              >
                <ResultRow label="Whole tube (all quadrants together)">
                  <Quantity q={formatSi(r.tubeCapacitanceF, 'F')} />
                </ResultRow>
                <ResultRow label="Inner diameter">
                  <Quantity q={{ value: formatSig(r.innerDiameterMm), unit: 'mm' }} />
                </ResultRow>
                <ResultRow label="First bending resonance" note="Sets the lateral scan speed.">
                  <Quantity q={formatSi(r.bendingModeHz, 'Hz')} />
                </ResultRow>
                <ResultRow label="First axial resonance" note="Sets how fast the Z loop can move the tube.">
                  <Quantity q={formatSi(r.axialModeHz, 'Hz')} />
                </ResultRow>
                <ResultRow label="Length ÷ outer diameter" note="Below about 2 the beam model is poor (common practice).">
                  <Quantity q={{ value: formatSig(r.lengthToDiameter, 3), unit: '' }} />
                </ResultRow>
              </ResultPanel>
              <p className="text-sm text-ink-soft">
                Take the quadrant capacitance to{' '}
                <Link className="text-teal-dark underline" to={paths.workbenchTool('drive-limits')}>
                  drive limits
                </Link>{' '}
                for what the amplifier must deliver.
              </p>
            </>
          ) : (
            <NoResult message={live.ok ? '' : live.message} />
          )
        }
      />
    </ToolPage>
  );
}
