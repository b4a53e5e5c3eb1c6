import { useState } from 'react';
import { type RunDto, type UpdateRunInput } from '@shared/schemas/run.ts';
import { RUN_METHODS, runMethodLabels, type RunMethod } from '@shared/schemas/run-vocabulary.ts';
import { displacementUnitLabels, voltageUnitLabels } from '@shared/units.ts';
import { Button } from '@/components/ui/button.tsx';
import { Field, FormError, errorMessage, inputClass } from '@/components/ui/form-bits.tsx';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';
import { useUpdateRun } from '../../api/update-run.ts';

const text = (s: string) => s.trim() || null;
const numberText = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/**
 * Correct a peak-to-peak reading or a sine record: its readings (peak-to-peak), method, date and conditions.
 * A sine record's samples are corrected by recording it again.
 */
export function RunDetailsForm({ run, onDone }: { run: RunDto; onDone: () => void }) {
  const update = useUpdateRun(run.id);
  const r = run.reading;
  const [method, setMethod] = useState<RunMethod>(run.method);
  const [measuredOn, setMeasuredOn] = useState(run.measuredOn ?? '');
  const [dx, setDx] = useState(numberText(r?.displacementPp));
  const [rx, setRx] = useState(numberText(r?.displacementResolution));
  const [dv, setDv] = useState(numberText(r?.voltsPp));
  const [rv, setRv] = useState(numberText(r?.voltsResolution));
  const [preload, setPreload] = useState(run.conditions?.preload ?? '');
  const [notes, setNotes] = useState(run.notes ?? '');
  const id = (f: string) => `run-${run.id}-${f}`;
  const x = displacementUnitLabels[run.displacementUnit];
  const v = voltageUnitLabels[run.voltageUnit];

  async function save() {
    const change: UpdateRunInput = {
      method,
      measuredOn: measuredOn || null,
      notes: text(notes),
      conditions: text(preload)
        ? { ...run.conditions, preload: text(preload)! }
        : run.conditions && { ...run.conditions, preload: undefined },
    };
    if (run.kind === 'peak-to-peak') {
      Object.assign(change, {
        displacementPp: parseOptionalNumber(dx),
        displacementResolution: parseOptionalNumber(rx),
        voltsPp: parseOptionalNumber(dv),
        voltsResolution: rv.trim() ? parseOptionalNumber(rv) : null,
      });
    }
    await update.mutateAsync(change);
    onDone();
  }

  return (
    <form
      noValidate
      aria-label="Correct this run"
      className="space-y-3 rounded-md border border-copper/40 bg-white p-3"
      onSubmit={(e) => {
        e.preventDefault();
        void save().catch(() => undefined);
      }}
    >
      {run.status === 'accepted' && (
        <p className="text-sm text-ink-soft">
          Saving a correction takes this accepted run out of the part&apos;s figures until it is accepted again.
        </p>
      )}
      {run.kind === 'peak-to-peak' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field id={id('dx')} label={`Peak-to-peak swing (${x})`}>
            <input id={id('dx')} inputMode="decimal" className={inputClass} value={dx} onChange={(e) => setDx(e.target.value)} />
          </Field>
          <Field id={id('rx')} label={`Reading resolution (${x})`}>
            <input id={id('rx')} inputMode="decimal" className={inputClass} value={rx} onChange={(e) => setRx(e.target.value)} />
          </Field>
          <Field id={id('dv')} label={`Peak-to-peak voltage (${v})`}>
            <input id={id('dv')} inputMode="decimal" className={inputClass} value={dv} onChange={(e) => setDv(e.target.value)} />
          </Field>
          <Field id={id('rv')} label={`Voltage resolution (${v}, optional)`}>
            <input id={id('rv')} inputMode="decimal" className={inputClass} value={rv} onChange={(e) => setRv(e.target.value)} />
          </Field>
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id={id('method')} label="Measured with">
          <select id={id('method')} className={inputClass} value={method} onChange={(e) => setMethod(e.target.value as RunMethod)}>
            {RUN_METHODS.map((m) => (
              <option key={m} value={m}>
                {runMethodLabels[m]}
              </option>
            ))}
          </select>
        </Field>
        <Field id={id('date')} label="Measured on">
          <input id={id('date')} type="date" className={inputClass} value={measuredOn} onChange={(e) => setMeasuredOn(e.target.value)} />
        </Field>
        <Field id={id('preload')} label="Preload or load">
          <input id={id('preload')} className={inputClass} value={preload} onChange={(e) => setPreload(e.target.value)} />
        </Field>
        <Field id={id('notes')} label="Notes">
          <input id={id('notes')} className={inputClass} value={notes} onChange={(e) => setNotes(e.target.value)} />
        </Field>
      </div>
      <FormError message={update.error ? errorMessage(update.error) : undefined} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save the correction'}
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
