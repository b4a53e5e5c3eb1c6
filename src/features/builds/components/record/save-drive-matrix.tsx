import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { DriveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { Button } from '@/components/ui/button.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { Field, FormError, errorMessage, inputClass } from '@/components/ui/form-bits.tsx';
import { paths } from '@/config/paths.ts';
import { ApiError } from '@/lib/api-client.ts';
import { buildQueries } from '../../api/build-queries.ts';
import { useSaveDriveMatrix } from '../../api/drive-matrix.ts';
import { actuatorLine } from './run-target.tsx';
import { MyBuildSelect } from './my-build-select.tsx';

/**
 * "Save onto an actuator": the mixer's G, offsets and drive limits go onto an XY pair of one of my builds,
 * where its page shows the drive matrix and the reachable region. `matrix` is null while the inputs are not usable.
 */
export function SaveDriveMatrix({
  matrix,
  signedIn,
}: {
  matrix: DriveMatrixInput | null;
  /** From the session: visitors get a sign-in line and cause no requests. */
  signedIn: boolean;
}) {
  const location = useLocation();
  const mine = useQuery({ ...buildQueries.mine(), enabled: signedIn });
  const [buildId, setBuildId] = useState<number | null>(null);
  const [actuatorId, setActuatorId] = useState<number | null>(null);
  const [measuredOn, setMeasuredOn] = useState('');
  const [saved, setSaved] = useState<ActuatorDto | null>(null);
  const build = useQuery({ ...buildQueries.detail(buildId ?? 0), enabled: buildId !== null });
  const save = useSaveDriveMatrix();

  if (!signedIn || (mine.error instanceof ApiError && mine.error.status === 401)) {
    return (
      <section aria-label="Save onto an actuator" className="rounded-lg border border-dashed border-rule bg-white p-4 text-sm">
        <p>
          Built this pair?{' '}
          <a className="text-teal-dark underline" href={paths.signIn(location.pathname + location.search)}>
            Sign in
          </a>{' '}
          to save the matrix onto an XY actuator of one of your builds.
        </p>
      </section>
    );
  }
  const pairs = (build.data?.actuators ?? []).filter((a) => a.axis === 'XY');
  const handleSave = () => {
    if (!matrix || actuatorId === null) return;
    save.mutate(
      { actuatorId, input: { ...matrix, ...(measuredOn ? { measuredOn } : {}) } },
      { onSuccess: (actuator) => setSaved(actuator) },
    );
  };
  return (
    <section aria-label="Save onto an actuator" className="space-y-3 rounded-lg border border-rule bg-white p-4 text-sm">
      <h2 className="font-semibold">Save onto an actuator</h2>
      <p className="text-ink-soft">
        Keep G, the offsets and the drive limits with an XY pair of one of your builds; its page then shows the matrix, the volts for a
        wanted position and the reachable region.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <MyBuildSelect
          id="matrix-build"
          value={buildId}
          onChange={(id) => {
            setBuildId(id);
            setActuatorId(null);
            setSaved(null);
          }}
        />
        <Field
          id="matrix-actuator"
          label="XY actuator"
          hint={
            buildId !== null && build.isSuccess && pairs.length === 0
              ? 'This build has no XY pair: add one in the build editor.'
              : undefined
          }
        >
          <select
            id="matrix-actuator"
            className={inputClass}
            disabled={buildId === null || build.isPending}
            value={actuatorId ?? ''}
            onChange={(e) => {
              setActuatorId(e.target.value ? Number(e.target.value) : null);
              setSaved(null);
            }}
          >
            <option value="">{buildId === null ? 'Choose a build first' : 'Choose an XY pair'}</option>
            {pairs.map((a) => (
              <option key={a.id} value={a.id}>
                {actuatorLine(a)}
                {a.driveMatrix ? ' · has a saved matrix' : ''}
              </option>
            ))}
          </select>
        </Field>
        <Field id="matrix-date" label="Measured on (optional)">
          <input id="matrix-date" type="date" className={inputClass} value={measuredOn} onChange={(e) => setMeasuredOn(e.target.value)} />
        </Field>
      </div>
      {!matrix && (
        <p className="text-ink-soft">
          Fix the inputs above first: the matrix needs an inverse and limits with each minimum below its maximum.
        </p>
      )}
      <FormError message={save.error ? errorMessage(save.error) : undefined} />
      {saved ? (
        <div role="status" className="flex flex-wrap items-center gap-2 rounded-md border border-teal bg-teal/5 p-3">
          <span>Saved onto {actuatorLine(saved)}.</span>
          <LinkButton variant="secondary" to={paths.build(saved.buildId)}>
            Open the build
          </LinkButton>
        </div>
      ) : (
        <Button onClick={handleSave} disabled={!matrix || actuatorId === null || save.isPending}>
          {pairs.find((a) => a.id === actuatorId)?.driveMatrix ? 'Replace the saved matrix' : 'Save onto this actuator'}
        </Button>
      )}
    </section>
  );
}
