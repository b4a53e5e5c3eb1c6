import { useDeferredValue, useId, useMemo, useState } from 'react';
import { useUrlSettings } from '@/features/workbench/form/use-url-settings.ts';
import { displacementUnits, voltageUnits } from '@shared/units.ts';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import { inputClass, InputField, SelectField } from '@/components/ui/form-bits.tsx';
import { NoResult, ResultNotesBlock } from '@/features/workbench/components/results.tsx';
import { RowProblems } from '@/features/workbench/components/row-problems.tsx';
import { ToolColumns, ToolPage } from '@/features/workbench/components/tool-page.tsx';
import { displacementOptions, voltageOptions } from '@/features/workbench/unit-options.ts';
import { exampleLoop, previewLinearise } from '@/features/workbench/linearise/linearise-preview.ts';
import { LineariseResults } from '@/features/workbench/linearise/linearise-results.tsx';
import { SaveLinearisation } from '@/features/builds/components/record/save-linearisation.tsx';
import { useSession } from '@/features/session/api/get-session.ts';
import { ToolInputs } from './tool-inputs.tsx';

const DEGREES = ['auto', '1', '2', '3', '4', '5'] as const;
const SETTINGS = {
  voltageUnit: { param: 'vu', fallback: 'V', allowed: voltageUnits },
  displacementUnit: { param: 'du', fallback: 'um', allowed: displacementUnits },
  degree: { param: 'deg', fallback: 'auto', allowed: DEGREES },
  stepNm: { param: 'step', fallback: '' },
};

export function LinearisePage() {
  const textId = useId();
  const session = useSession();
  const [text, setText] = useState(exampleLoop);
  const [settings, set] = useUrlSettings(SETTINGS);
  const { voltageUnit, displacementUnit, degree, stepNm } = settings;
  const deferred = useDeferredValue(text);
  const r = useMemo(
    () => previewLinearise(deferred, { voltageUnit, displacementUnit, degree, stepNm }),
    [deferred, voltageUnit, displacementUnit, degree, stepNm],
  );
  return (
    <ToolPage
      slug="linearise"
      linkNote="the pasted run itself is not kept in the link, only the settings"
      lead="Fit a curve to each sweep of a calibration run and get the table of volts that puts the actuator where you want it, hysteresis branch by branch."
    >
      <ToolColumns
        inputs={
          <ToolInputs>
            <section aria-label="Calibration run" className="space-y-3 rounded-lg border border-rule bg-white p-4">
              <div>
                <label htmlFor={textId} className="block text-sm font-medium">
                  Points (CSV: volts, displacement, sweep up or down)
                </label>
                <textarea
                  id={textId}
                  rows={9}
                  spellCheck={false}
                  aria-describedby={`${textId}-hint`}
                  className={`num mt-1 text-sm ${inputClass}`}
                  value={text}
                  onChange={(e) => setText(e.target.value)}
                />
                <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
                  Label every point up or down to get one curve per branch, or none for a single curve. The example is invented; replace it
                  with your run.
                </p>
              </div>
              <CsvFileInput maxBytes={12 * 1024 * 1024} tooLarge="thin the run first." onText={setText} />
              <RowProblems used={r.checked.points.length} problems={r.checked.problems} note={r.checked.note} what="Line" />
            </section>
            <section aria-label="Settings" className="grid gap-3 rounded-lg border border-rule bg-white p-4 sm:grid-cols-2">
              <SelectField
                id="lin-vu"
                label="Voltage unit"
                value={voltageUnit}
                options={voltageOptions}
                onChange={(e) => set('voltageUnit', e.target.value)}
              />
              <SelectField
                id="lin-du"
                label="Displacement unit"
                value={displacementUnit}
                options={displacementOptions}
                onChange={(e) => set('displacementUnit', e.target.value)}
              />
              <SelectField
                id="lin-degree"
                label="Polynomial degree"
                hint="Auto: the smallest degree the data support (F-test at 5 %)."
                value={degree}
                options={DEGREES.map((d) => ({ value: d, label: d === 'auto' ? 'Auto' : d }))}
                onChange={(e) => set('degree', e.target.value)}
              />
              <InputField
                id="lin-step"
                label="Table step (nm)"
                hint="Empty: the common range in 20 steps."
                inputMode="decimal"
                value={stepNm}
                onChange={(e) => set('stepNm', e.target.value)}
              />
            </section>
          </ToolInputs>
        }
        results={
          r.ok ? (
            <>
              <ResultNotesBlock r={r.result} />
              <LineariseResults r={r.result} />
              <SaveLinearisation input={r.input} signedIn={Boolean(session.data?.user)} />
            </>
          ) : (
            <NoResult message={r.message} />
          )
        }
      />
    </ToolPage>
  );
}
