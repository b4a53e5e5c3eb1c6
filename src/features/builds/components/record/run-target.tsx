import { useQuery } from '@tanstack/react-query';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { Field, inputClass } from '@/components/ui/form-bits.tsx';
import { MyBuildSelect } from './my-build-select.tsx';
import { buildQueries } from '../../api/build-queries.ts';

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
  const build = useQuery({ ...buildQueries.detail(buildId ?? 0), enabled: buildId !== null });
  const actuators = build.data?.actuators ?? [];
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <MyBuildSelect
        id="record-build"
        value={buildId}
        onChange={(id) => {
          onBuild(id);
          onActuator(null);
        }}
      />
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
