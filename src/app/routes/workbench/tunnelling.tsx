import { FieldGroup, FormNumber } from '@/features/workbench/components/fields.tsx';
import { Headline, NoResult, Quantity, ResultPanel, ResultRow } from '@/features/workbench/components/results.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { formatSig } from '@shared/format/measured-number.ts';
import { useLiveForm } from '@/features/workbench/form/use-live-form.ts';
import { tunnellingForm } from '@/features/workbench/simple/tunnelling-form.ts';
import { tunnellingCalculator } from '@shared/workbench/calculators/simple-calculators.ts';
import { ToolInputs } from './tool-inputs.tsx';

export function TunnellingPage() {
  const { form, live } = useLiveForm(tunnellingForm, { workFunctionEv: 4, wantedRatio: 10 }, tunnellingCalculator.compute);
  const r = live.ok ? live.result : null;
  return (
    <ToolPage slug="tunnelling" lead="How steeply the tunnelling current falls with the gap: it sets how finely the Z loop must resolve.">
      <ToolColumns
        inputs={
          <ToolInputs>
            <FieldGroup legend="Barrier">
              <FormNumber
                form={form}
                name="workFunctionEv"
                label="Work function φ"
                unit="eV"
                hint="Effective barrier height of the junction."
              />
              <FormNumber
                form={form}
                name="wantedRatio"
                label="Wanted current ratio per Å"
                unit="×"
                optional
                hint="Finds the barrier that gives it."
              />
            </FieldGroup>
          </ToolInputs>
        }
        results={
          r ? (
            <ResultPanel
              headline={
                <Headline label="Current change per ångström of gap">
                  <span className="num">×{formatSig(r.currentRatioPerAngstrom, 3)}</span>
                </Headline>
              }
              basis="I ∝ exp(−2κd), κ = √(2·mₑ·φ)/ħ ≈ 0.5123·√(φ/eV) Å⁻¹ — one-dimensional WKB, constants CODATA 2018 (recalled formula, not yet checked against a source)."
            >
              <ResultRow label="Decay constant κ">
                <Quantity q={{ value: formatSig(r.decayConstantPerAngstrom), unit: 'Å⁻¹' }} />
              </ResultRow>
              <ResultRow label="Gap change per decade of current" note="ln 10 / 2κ: a tenfold current change.">
                <Quantity q={{ value: formatSig(r.gapChangePerDecadeAngstrom), unit: 'Å' }} />
              </ResultRow>
              {r.workFunctionForWantedRatioEv !== null && (
                <ResultRow label="Barrier for the wanted ratio">
                  <Quantity q={{ value: formatSig(r.workFunctionForWantedRatioEv, 3), unit: 'eV' }} />
                </ResultRow>
              )}
            </ResultPanel>
          ) : (
            <NoResult message={live.ok ? '' : live.message} />
          )
        }
      />
    </ToolPage>
  );
}
