import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { actuatorStartSearch, type StartTool } from '@shared/workbench/start-links.ts';
import { formatSig } from '@shared/format/measured-number.ts';
import { Button } from '@/components/ui/button.tsx';
import { Field, inputClass } from '@/components/ui/form-bits.tsx';
import { paths } from '@/config/paths.ts';
import { ApiError } from '@/lib/api-client.ts';
import { buildQueries } from '../../api/build-queries.ts';
import { actuatorForStart, newestGain } from './actuator-start.ts';
import { actuatorLine } from './run-target.tsx';

/**
 * "Start from my actuator" on a workbench page: one of my builds' actuators fills the page (its part's geometry
 * and material, its newest gain; on the mixer an XY pair's saved matrix) through the page's URL inputs.
 * Nothing shows to visitors.
 */
export function StartFromActuator({
  tool,
  signedIn,
}: {
  tool: StartTool;
  /** From the session: visitors see nothing and cause no requests. */ signedIn: boolean;
}) {
  const navigate = useNavigate();
  const mine = useQuery({ ...buildQueries.mine(), enabled: signedIn });
  const [buildId, setBuildId] = useState<number | null>(null);
  const [actuatorId, setActuatorId] = useState<number | null>(null);
  const build = useQuery({ ...buildQueries.detail(buildId ?? 0), enabled: buildId !== null });
  if (!signedIn || (mine.error instanceof ApiError && mine.error.status === 401) || (mine.isSuccess && mine.data.items.length === 0))
    return null;
  const actuators = (build.data?.actuators ?? []).filter((a) => (tool === 'mixing' ? a.axis === 'XY' && a.driveMatrix : true));
  const chosen = actuators.find((a) => a.id === actuatorId);
  const gain = chosen ? newestGain(chosen) : null;
  const handleFill = () => {
    if (!chosen) return;
    void navigate({ pathname: paths.workbenchTool(tool), search: actuatorStartSearch(tool, actuatorForStart(chosen)) });
  };
  return (
    <details className="rounded-lg border border-rule bg-white p-4 text-sm">
      <summary className="cursor-pointer font-semibold">Start from my actuator</summary>
      <div className="mt-3 grid gap-3 sm:grid-cols-2">
        <Field id={`start-${tool}-build`} label="Build">
          <select
            id={`start-${tool}-build`}
            className={inputClass}
            value={buildId ?? ''}
            onChange={(e) => {
              setBuildId(e.target.value ? Number(e.target.value) : null);
              setActuatorId(null);
            }}
          >
            <option value="">{mine.isPending ? 'Loading your builds…' : 'Choose a build'}</option>
            {(mine.data?.items ?? []).map((b) => (
              <option key={b.id} value={b.id}>
                {b.title}
              </option>
            ))}
          </select>
        </Field>
        <Field
          id={`start-${tool}-actuator`}
          label={tool === 'mixing' ? 'XY pair with a saved matrix' : 'Actuator'}
          hint={buildId !== null && build.isSuccess && actuators.length === 0 ? 'None in this build.' : undefined}
        >
          <select
            id={`start-${tool}-actuator`}
            className={inputClass}
            disabled={buildId === null || build.isPending}
            value={actuatorId ?? ''}
            onChange={(e) => setActuatorId(e.target.value ? Number(e.target.value) : null)}
          >
            <option value="">{buildId === null ? 'Choose a build first' : 'Choose an actuator'}</option>
            {actuators.map((a) => (
              <option key={a.id} value={a.id}>
                {actuatorLine(a)}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <Button variant="secondary" disabled={!chosen} onClick={handleFill}>
          Fill from this actuator
        </Button>
        {chosen && tool !== 'mixing' && (
          <span className="text-ink-soft">
            {gain === null ? 'No run yet: geometry and material only.' : `Newest gain ${formatSig(gain)} nm/V, with its part's geometry.`}
          </span>
        )}
      </div>
    </details>
  );
}
