import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { FieldGroup, FormNumber, FormRadios } from '@/features/workbench/components/fields.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow, ResultWarnings } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { loadedGainForm, stiffnessSources } from '@/features/workbench/expected/loaded-gain-form.ts';
import { formatFixed, formatLengthNm, formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { loadedGainCalculator } from '@shared/workbench/calculators/loaded-gain-calculator.ts';
import { ToolInputs } from './tool-inputs.tsx';

const defaults = {
  freeGainNmPerV: 102.6,
  stiffnessSource: 'bender',
  benderLengthMm: 12,
  benderWidthMm: 2,
  benderThicknessMm: 0.6,
  benderModulusGpa: 61,
  springRateNPerM: 100,
  preloadForceN: 1,
} as const;

export function LoadedGainPage() {
  const { form, live } = useLiveForm(loadedGainForm, defaults, loadedGainCalculator.compute);
  const fromBender = form.watch('stiffnessSource') === 'bender';
  const r = live.ok ? live.result : null;
  return (
    <ToolPage
      slug="loaded-gain"
      lead="An actuator pushing against a spring, such as a dial indicator on a bender, moves less than it would free: what is left, and how far the preload pushes it back."
    >
      <ToolColumns
        inputs={
          <ToolInputs start="loaded-gain">
            <FieldGroup legend="Actuator">
              <FormNumber
                form={form}
                name="freeGainNmPerV"
                label="Free gain"
                unit="nm/V"
                hint={
                  <>
                    Unloaded, from a calibration run or the{' '}
                    <Link className="text-teal-dark underline" to={paths.workbenchTool('expected-gain')}>
                      expected gain
                    </Link>
                    .
                  </>
                }
              />
              <FormRadios form={form} name="stiffnessSource" legend="Stiffness" options={stiffnessSources} />
              {fromBender ? (
                <>
                  <FormNumber key="bl" form={form} name="benderLengthMm" label="Free length L" unit="mm" />
                  <FormNumber key="bw" form={form} name="benderWidthMm" label="Width w" unit="mm" />
                  <FormNumber
                    key="bt"
                    form={form}
                    name="benderThicknessMm"
                    label="Thickness t"
                    unit="mm"
                    hint="The whole bender, both layers and any shim."
                  />
                  <FormNumber
                    key="be"
                    form={form}
                    name="benderModulusGpa"
                    label="Young's modulus E"
                    unit="GPa"
                    hint="PZT-5A 61.0 GPa, PZT-5H 60.6 GPa (Source: Erturk & Inman 2011)."
                  />
                </>
              ) : (
                <FormNumber
                  key="ka"
                  form={form}
                  name="actuatorStiffnessNPerM"
                  label="Actuator stiffness kₐ"
                  unit="N/m"
                  hint="Force at the moving end per unit deflection."
                />
              )}
            </FieldGroup>
            <FieldGroup legend="Spring it works against">
              <FormNumber
                form={form}
                name="springRateNPerM"
                label="Spring rate kₛ"
                unit="N/m"
                hint="For a dial indicator: the change in measuring force over its travel."
              />
              <FormNumber
                form={form}
                name="preloadForceN"
                label="Preload force F"
                unit="N"
                optional
                hint="The force the indicator presses with at its resting reading."
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
                  <Headline label="Gain against the spring" sub={`${formatFixed(r.gainLossPct, 1)} % of the free gain is lost`}>
                    <span className="num">{formatSig(r.loadedGainNmPerV)}</span> nm/V
                  </Headline>
                }
                basis={
                  'ΔL ≈ ΔL₀·kₐ/(kₐ + kₛ): recalled formula, not yet checked against a source; it follows from the force balance ' +
                  'kₐ(δ₀ − δ) = kₛ·δ of two springs in series (calculated). Bender stiffness k = E·w·t³/4L³ (Source: Timoshenko, ' +
                  'Vibration Problems in Engineering), the layers taken as one material (common practice). Preload deflection ' +
                  'F/kₐ (calculated).'
                }
              >
                <ResultRow label="Free gain">
                  <Quantity q={{ value: formatSig(r.freeGainNmPerV), unit: 'nm/V' }} />
                </ResultRow>
                <ResultRow label="Actuator stiffness kₐ" note={r.stiffnessFromBender ? 'From the bender: k = E·w·t³/4L³.' : undefined}>
                  <Quantity q={{ value: formatSig(r.actuatorStiffnessNPerM), unit: 'N/m' }} />
                </ResultRow>
                <ResultRow label="Spring ÷ actuator kₛ/kₐ">
                  <Quantity q={{ value: formatSig(r.springToActuatorRatio, 3), unit: '' }} />
                </ResultRow>
                {r.preloadDeflectionNm !== null && (
                  <ResultRow label="Pushed back by the preload" note="Static, before any drive: F/kₐ.">
                    <Quantity q={formatLengthNm(r.preloadDeflectionNm)} />
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
