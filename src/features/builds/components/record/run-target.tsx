import { useQuery } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { Field, describe, inputClass } from '@/components/ui/form-bits.tsx';
import { buildQueries } from '../../api/build-queries.ts';
import { ApiError } from '@/lib/api-client.ts';

/** Builds that still take runs: drafts, returned and published builds (those pending review or declined are frozen). */
const TAKES_RUNS = new Set(['draft', 'returned', 'published']);

/** The actuator's line in the picker: label or axis, the part, and its expected gain. */
export const actuatorLine = (a: ActuatorDto) =>
  `${a.label ?? `${a.axis} axis`} · ${a.part.name}${a.expectedGain ? ` · expected ${Number(a.expectedGain.gainNmPerV.toPrecision(3))} nm/V` : ''}`;

/** Pick one of my builds and one of its actuators (or ask for a new one). `actuatorId` 'new' opens the actuator form. */
export function RunTarget({
  buildId,
  actuatorId,
  onBuild,
  onActuator,
}: {
  buildId: number | null;
  actuatorId: number | 'new' | null;
  onBuild: (id: number | null) => void;
  onActuator: (id: number | 'new' | null, actuator?: ActuatorDto) => void;
}) {
  const mine = useQuery(buildQueries.mine());
  const build = useQuery({ ...buildQueries.detail(buildId ?? 0), enabled: buildId !== null });
  if (mine.error instanceof ApiError && mine.error.status === 401) return null;
  const builds = (mine.data?.items ?? []).filter((b) => TAKES_RUNS.has(b.status));
  const actuators = build.data?.actuators ?? [];
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <Field
        id="record-build"
        label="Build"
        hint={builds.length === 0 && mine.isSuccess ? 'No build of yours takes runs yet: start one first.' : undefined}
      >
        <select
          id="record-build"
          className={inputClass}
          value={buildId ?? ''}
          {...describe('record-build', undefined, builds.length === 0)}
          onChange={(e) => {
            onBuild(e.target.value ? Number(e.target.value) : null);
            onActuator(null);
          }}
        >
          <option value="">{mine.isPending ? 'Loading your builds…' : 'Choose a build'}</option>
          {builds.map((b) => (
            <option key={b.id} value={b.id}>
              {b.title} ({b.status})
            </option>
          ))}
        </select>
      </Field>
      <Field id="record-actuator" label="Actuator">
        <select
          id="record-actuator"
          className={inputClass}
          disabled={buildId === null || build.isPending}
          value={actuatorId ?? ''}
          onChange={(e) => {
            const v = e.target.value;
            if (v === 'new') return onActuator('new');
            const id = v ? Number(v) : null;
            onActuator(
              id,
              actuators.find((a) => a.id === id),
            );
          }}
        >
          <option value="">{buildId === null ? 'Choose a build first' : 'Choose an actuator'}</option>
          {actuators.map((a) => (
            <option key={a.id} value={a.id}>
              {actuatorLine(a)}
            </option>
          ))}
          {buildId !== null && <option value="new">New actuator in this build…</option>}
        </select>
      </Field>
    </div>
  );
}
