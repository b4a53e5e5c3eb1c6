import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { createRunInput, type RunDto, type RunFitDto, type RunRecordData } from '@shared/schemas/run.ts';
import { RUN_METHODS, runMethodLabels, type RunMethod } from '@shared/schemas/run-vocabulary.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { fitRun, type RunFit } from '@shared/workbench/run-fit.ts';
import { toVolts } from '@shared/units.ts';
import { makerRunChecks } from '@shared/review/maker-checks.ts';
import { formatDate } from '@shared/format/dates.ts';
import { Button } from '@/components/ui/button.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { Field, FormError, errorMessage, inputClass } from '@/components/ui/form-bits.tsx';
import { paths } from '@/config/paths.ts';
import { ApiError } from '@/lib/api-client.ts';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';
import { buildQueries } from '../../api/build-queries.ts';
import { useCreateActuator } from '../../api/actuators.ts';
import { useCreateRun } from '../../api/create-run.ts';
import { ActuatorForm } from '../editor/actuator-form.tsx';
import { FitSummary } from '../editor/fit-summary.tsx';
import { MakerFlags } from './maker-flags.tsx';
import { DataLicenceNotice } from '../data-licence-notice.tsx';
import { RunTarget, actuatorLine } from './run-target.tsx';
import { RecordRunInvite } from './record-run-invite.tsx';

/** The stored fit as the run's page will show it. */
const asDto = (f: RunFit): RunFitDto => ({
  ...f,
  gainStdErrNmPerV: f.gainStdUncertaintyNmPerV,
  residualStdNm: f.residualStdNm ?? Number.NaN,
});
const text = (s: string) => s.trim() || undefined;

/**
 * "Record as a run": what a workbench page computed goes into one of my builds as a calibration run,
 * with the same data, units and the fit the page showed (the server refits with the same shared code). Loaded
 * only when a signed-in maker opens it, so a workbench page does not carry the form's code for every visitor.
 */
export function RecordAsRun({
  data,
  defaultMethod = 'indicator',
  onClose,
}: {
  data: RunRecordData | null;
  defaultMethod?: RunMethod;
  /** "Cancel": back to the invitation (the page shows `RecordRunInvite` until the maker opens the form). */
  onClose: () => void;
}) {
  const mine = useQuery(buildQueries.mine());
  const [buildId, setBuildId] = useState<number | null>(null);
  const [actuatorId, setActuatorId] = useState<number | 'new' | null>(null);
  const [actuator, setActuator] = useState<ActuatorDto | undefined>();
  const [method, setMethod] = useState<RunMethod>(defaultMethod);
  const [measuredOn, setMeasuredOn] = useState('');
  const [preload, setPreload] = useState('');
  const [temperature, setTemperature] = useState('');
  const [notes, setNotes] = useState('');
  const [frequency, setFrequency] = useState('');
  const [saved, setSaved] = useState<{ run: RunDto; actuator: ActuatorDto } | null>(null);
  const createActuator = useCreateActuator(buildId ?? 0);
  const createRun = useCreateRun(typeof actuatorId === 'number' ? actuatorId : 0);

  const temperatureC = parseOptionalNumber(temperature);
  const frequencyHz = parseOptionalNumber(frequency);
  const candidate = useMemo(() => {
    if (!data) return null;
    const conditions = { preload: text(preload), temperatureC: Number.isNaN(temperatureC) ? undefined : temperatureC };
    const typedHz = frequencyHz !== undefined && Number.isFinite(frequencyHz) && frequencyHz > 0 ? frequencyHz : undefined;
    const withDrive = (() => {
      if (data.kind === 'points') return { ...data, drive: { kind: 'dc-steps' as const } };
      if (data.kind === 'peak-to-peak') {
        const amplitudeV = toVolts(data.voltsPp, data.voltageUnit) / 2;
        return typedHz ? { ...data, frequencyHz: typedHz, drive: { kind: 'sine' as const, frequencyHz: typedHz, amplitudeV } } : data;
      }
      return data;
    })();
    const parsed = createRunInput.safeParse({
      ...withDrive,
      // A lattice run is always a reference sample's; its schema says so.
      ...(data.kind === 'lattice' ? {} : { method }),
      ...(measuredOn ? { measuredOn } : {}),
      ...(Object.values(conditions).some((v) => v !== undefined) ? { conditions } : {}),
      ...(text(notes) ? { notes: text(notes) } : {}),
    });
    if (!parsed.success) return { ok: false as const, message: parsed.error.issues[0]?.message ?? 'These readings cannot be stored.' };
    try {
      const fit = fitRun(parsed.data, actuator?.axis);
      // A sine record states its own drive: the fitted frequency and amplitude.
      const input =
        parsed.data.kind === 'sine-record' && fit.sine
          ? { ...parsed.data, drive: { kind: 'sine' as const, frequencyHz: fit.sine.frequencyHz, amplitudeV: fit.sine.voltsAmplitudeV } }
          : parsed.data;
      return { ok: true as const, input, fit };
    } catch (err) {
      return { ok: false as const, message: errorMessage(err) };
    }
  }, [data, method, measuredOn, preload, temperatureC, notes, frequencyHz, actuator]);

  if (mine.error instanceof ApiError && mine.error.status === 401) return <RecordRunInvite signedIn={false} ready={Boolean(data)} />;
  if (saved) {
    return (
      <section aria-label="Record as a run" className="rounded-lg border border-teal bg-teal/5 p-4 text-sm" role="status">
        <p className="font-medium">
          Recorded: run of {formatDate(saved.run.measuredOn ?? saved.run.createdAt)} on {actuatorLine(saved.actuator)}, pending review.
        </p>
        <p className="mt-2 flex flex-wrap gap-2">
          <LinkButton to={paths.editBuild(saved.run.buildId)}>Open the build editor</LinkButton>
          <Button variant="ghost" onClick={() => setSaved(null)}>
            Record another
          </Button>
        </p>
      </section>
    );
  }
  const checks =
    candidate?.ok && actuator
      ? makerRunChecks(candidate.input, candidate.fit, {
          maxVolts: actuator.maxVolts,
          expectedGainNmPerV: actuator.expectedGain?.gainNmPerV ?? null,
          partMedianNmPerV: actuator.part.stats.gainMedianNmPerV,
        })
      : null;
  const ready = candidate?.ok && typeof actuatorId === 'number';

  async function save() {
    if (!candidate?.ok || typeof actuatorId !== 'number' || !actuator) return;
    const run = await createRun.mutateAsync(candidate.input);
    setSaved({ run, actuator });
  }

  return (
    <section aria-labelledby="record-title" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="record-title" className="text-base font-semibold">
        Record as a run
      </h2>
      <DataLicenceNotice />
      <RunTarget
        buildId={buildId}
        actuatorId={actuatorId}
        onBuild={setBuildId}
        onActuator={(id, a) => {
          setActuatorId(id);
          setActuator(a);
        }}
      />
      {actuatorId === 'new' && buildId !== null && (
        <div className="rounded-md border border-rule p-3">
          <ActuatorForm
            idPrefix="record-new-actuator"
            submitLabel="Add this actuator"
            onCancel={() => setActuatorId(null)}
            onSave={async (values) => {
              const a = await createActuator.mutateAsync(values);
              setActuatorId(a.id);
              setActuator(a);
            }}
          />
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        {data?.kind !== 'lattice' && (
          <Field id="record-method" label="Measured with">
            <select id="record-method" className={inputClass} value={method} onChange={(e) => setMethod(e.target.value as RunMethod)}>
              {RUN_METHODS.map((m) => (
                <option key={m} value={m}>
                  {runMethodLabels[m]}
                </option>
              ))}
            </select>
          </Field>
        )}
        <Field id="record-date" label="Measured on" hint="Leave empty for today.">
          <input id="record-date" type="date" className={inputClass} value={measuredOn} onChange={(e) => setMeasuredOn(e.target.value)} />
        </Field>
        {data?.kind === 'peak-to-peak' && (
          <Field
            id="record-frequency"
            label="Drive frequency (Hz)"
            hint="Optional; stored with the run as its sine drive."
            error={Number.isNaN(frequencyHz) ? 'Not a number.' : undefined}
          >
            <input
              id="record-frequency"
              inputMode="decimal"
              className={inputClass}
              value={frequency}
              onChange={(e) => setFrequency(e.target.value)}
            />
          </Field>
        )}
        <Field id="record-preload" label="Preload or load" hint="Optional, e.g. “spring, about 2 N”.">
          <input id="record-preload" className={inputClass} value={preload} onChange={(e) => setPreload(e.target.value)} />
        </Field>
        <Field id="record-temp" label="Temperature (°C)" error={Number.isNaN(temperatureC) ? 'Not a number.' : undefined}>
          <input
            id="record-temp"
            inputMode="decimal"
            className={inputClass}
            value={temperature}
            onChange={(e) => setTemperature(e.target.value)}
          />
        </Field>
        <Field id="record-notes" label="Notes" className="sm:col-span-2">
          <textarea id="record-notes" rows={2} className={inputClass} value={notes} onChange={(e) => setNotes(e.target.value)} />
        </Field>
      </div>
      {candidate?.ok ? (
        <FitSummary fit={asDto(candidate.fit)} label="The run will be stored with this fit (Scanwright recomputes it from your data)" />
      ) : (
        <FormError message={candidate?.message ?? 'Nothing to record yet.'} />
      )}
      {checks && <MakerFlags flags={checks.flags} overLimit={checks.overLimit} />}
      <FormError message={createRun.error ? errorMessage(createRun.error) : undefined} />
      <div className="flex flex-wrap gap-2">
        <Button disabled={!ready || createRun.isPending} onClick={() => void save().catch(() => undefined)}>
          {createRun.isPending ? 'Recording…' : 'Record this run'}
        </Button>
        <Button variant="ghost" onClick={onClose}>
          Not now
        </Button>
        {buildId !== null && (
          <Link className="self-center text-sm text-teal-dark underline" to={paths.editBuild(buildId)}>
            Open the build
          </Link>
        )}
      </div>
    </section>
  );
}
