import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { FieldGroup, FormNumber, FormSelect, SelectInput } from '@/features/workbench/components/fields.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultWarnings } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSi, formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { usePresetField } from '@/features/workbench/form/use-preset.ts';
import { useUnitConversion } from '@/hooks/use-unit-conversion.ts';
import { resonanceForm, resonancePresets } from '@/features/workbench/simple/resonance-form.ts';
import { resonanceCalculator } from '@shared/workbench/calculators/resonance-calculator.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = { preset: 'PZT-5A', dimensionUnit: 'mm', length: 12, thickness: 0.6, youngsModulusGpa: 61, densityKgPerM3: 7750 } as const;
/** Fields in the chosen dimension unit, converted when it changes (1 mm = 1000 µm). */
const lengthFields = ['length', 'thickness', 'width'] as const;
const convertDimension = (v: number, from: string, to: string) => (from === to ? v : from === 'mm' ? v * 1000 : v / 1000);

const units = [
  { value: 'mm', label: 'mm' },
  { value: 'um', label: 'µm' },
];

export function ResonancePage() {
  const { form, live } = useLiveForm(resonanceForm, defaults, resonanceCalculator.compute);
  const unit = form.watch('dimensionUnit') === 'um' ? 'µm' : 'mm';
  useUnitConversion(form, 'dimensionUnit', lengthFields, convertDimension);
  const { registration: presetField, preset } = usePresetField(form, resonancePresets, (p) => ({
    youngsModulusGpa: p.eGpa,
    densityKgPerM3: p.rho,
  }));
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="resonance"
      lead="First bending mode of a clamped bender bar or a cantilever lever, with an optional tip mass, and its spring constant."
    >
      <ToolColumns
        inputs={
          <ToolInputs start="resonance">
            <FieldGroup legend="Material">
              <div className="sm:col-span-2">
                <SelectInput
                  label="Preset"
                  registration={presetField}
                  options={resonancePresets}
                  hint={preset?.source ?? 'your own values'}
                />
              </div>
              <FormNumber form={form} name="youngsModulusGpa" label="Young's modulus E" unit="GPa" />
              <FormNumber form={form} name="densityKgPerM3" label="Density ρ" unit="kg/m³" />
            </FieldGroup>
            <FieldGroup legend="Beam (clamped at one end)">
              <FormSelect
                form={form}
                name="dimensionUnit"
                label="Dimensions in"
                options={units}
                hint="Changing it converts the dimensions."
              />
              <FormNumber form={form} name="length" label="Free length L" unit={unit} />
              <FormNumber form={form} name="thickness" label="Thickness t" unit={unit} />
              <FormNumber form={form} name="width" label="Width w" unit={unit} optional hint="For the spring constant and a tip mass." />
              <FormNumber
                form={form}
                name="tipMassMg"
                label="Tip mass M"
                unit="mg"
                optional
                hint="A mirror, probe or holder at the free end."
              />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <>
              <ResultWarnings warnings={r.warnings} />
              <ResultPanel
                headline={
                  <Headline label={r.withTipMassHz === null ? 'First resonance f₁' : 'First resonance f₁, with the tip mass'}>
                    <Quantity q={formatSi(r.movingModeHz, 'Hz')} />
                  </Headline>
                }
                basis={
                  'Euler–Bernoulli cantilever, f₁ = (1.8751²/2π)·(t/L²)·√(E/12ρ) ≈ 0.1615·(t/L²)·√(E/ρ) (Source: Rao, Mechanical ' +
                  'Vibrations; Timoshenko, Vibration Problems in Engineering); k = E·w·t³/4L³; a tip mass through the effective ' +
                  'mass 0.2427·m (calculated from the formula). The line-rate ceilings follow the mode that moves: with the tip ' +
                  'mass when one is given.'
                }
              >
                {r.withTipMassHz !== null && (
                  <ResultRow label="Bare beam, without the tip mass">
                    <Quantity q={formatSi(r.firstModeHz, 'Hz')} />
                  </ResultRow>
                )}
                <ResultRow label="Spring constant k" note="Force at the tip per unit deflection.">
                  {r.springConstantNPerM === null ? (
                    <span className="text-sm text-ink-soft">needs the width</span>
                  ) : (
                    <Quantity q={{ value: formatSig(r.springConstantNPerM), unit: 'N/m' }} />
                  )}
                </ResultRow>
                {r.beamMassKg !== null && (
                  <ResultRow label="Beam mass m">
                    <Quantity q={formatSi(r.beamMassKg * 1000, 'g', 4, ['n', ''])} />
                  </ResultRow>
                )}
                <ResultRow label="Length ÷ thickness" note="Thin-beam theory holds above about 10 (common practice).">
                  <Quantity q={{ value: formatSig(r.lengthToThickness, 3), unit: '' }} />
                </ResultRow>
                <ResultRow label="Line rate, sine-like scan" note="f₁/10 (common practice)">
                  <Quantity q={formatSi(r.lineRateCeilingSineLikeHz, 'Hz')} />
                </ResultRow>
                <ResultRow
                  label="Line rate, triangular raster"
                  note={
                    <>
                      f₁/100 (Source: Bae &amp; Granick, Rev. Sci. Instrum. 2000). Plan the rest in the{' '}
                      <Link className="text-teal-dark underline" to={paths.workbenchTool('scan-planner')}>
                        scan planner
                      </Link>
                      .
                    </>
                  }
                >
                  <Quantity q={formatSi(r.lineRateCeilingTriangleHz, 'Hz')} />
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
