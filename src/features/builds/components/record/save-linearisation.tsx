import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { LineariseInput } from '@shared/schemas/linearise.ts';
import { Button } from '@/components/ui/button.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { Field, FormError, errorMessage, inputClass } from '@/components/ui/form-bits.tsx';
import { paths } from '@/config/paths.ts';
import { buildQueries } from '../../api/build-queries.ts';
import { useSaveLinearisation } from '../../api/linearisation.ts';
import { MyBuildSelect } from './my-build-select.tsx';
import { actuatorLine } from './run-target.tsx';

/** "Save onto an actuator": the run and settings go to one of my actuators, where the server fits them again and keeps the table. */
export function SaveLinearisation({ input, signedIn }: { input: LineariseInput | null; signedIn: boolean }) {
  const location = useLocation();
  const [buildId, setBuildId] = useState<number | null>(null);
  const [actuatorId, setActuatorId] = useState<number | null>(null);
  const [measuredOn, setMeasuredOn] = useState('');
  const [saved, setSaved] = useState<ActuatorDto | null>(null);
  const build = useQuery({ ...buildQueries.detail(buildId ?? 0), enabled: signedIn && buildId !== null });
  const save = useSaveLinearisation();
  if (!signedIn)
    return (
      <p className="rounded-lg border border-dashed border-rule bg-white p-4 text-sm">
        <a className="text-teal-dark underline" href={paths.signIn(location.pathname + location.search)}>
          Sign in
        </a>{' '}
        to keep this table with an actuator of one of your builds.
      </p>
    );
  if (saved)
    return (
      <p role="status" className="flex flex-wrap items-center gap-2 rounded-lg border border-teal bg-teal/5 p-4 text-sm">
        Saved on {actuatorLine(saved)}.<LinkButton to={paths.editBuild(saved.buildId)}>Open the build editor</LinkButton>
      </p>
    );
  return (
    <section aria-label="Save onto an actuator" className="space-y-3 rounded-lg border border-rule bg-white p-4 text-sm">
      <h2 className="font-semibold">Save onto an actuator</h2>
      <div className="grid gap-3 sm:grid-cols-2">
        <MyBuildSelect
          id="lin-build"
          value={buildId}
          onChange={(id) => {
            setBuildId(id);
            setActuatorId(null);
          }}
        />
        <Field id="lin-actuator" label="Actuator">
          <select
            id="lin-actuator"
            className={inputClass}
            disabled={buildId === null || build.isPending}
            value={actuatorId ?? ''}
            onChange={(e) => setActuatorId(e.target.value ? Number(e.target.value) : null)}
          >
            <option value="">{buildId === null ? 'Choose a build first' : 'Choose an actuator'}</option>
            {(build.data?.actuators ?? []).map((a) => (
              <option key={a.id} value={a.id}>
                {actuatorLine(a)}
              </option>
            ))}
          </select>
        </Field>
        <Field id="lin-date" label="Measured on" hint="Optional.">
          <input id="lin-date" type="date" className={inputClass} value={measuredOn} onChange={(e) => setMeasuredOn(e.target.value)} />
        </Field>
      </div>
      <FormError message={save.error ? errorMessage(save.error) : undefined} />
      <Button
        disabled={!input || actuatorId === null || save.isPending}
        onClick={() =>
          input &&
          actuatorId !== null &&
          save.mutate({ actuatorId, input: { ...input, ...(measuredOn ? { measuredOn } : {}) } }, { onSuccess: setSaved })
        }
      >
        {save.isPending ? 'Saving…' : 'Save the linearisation'}
      </Button>
    </section>
  );
}
