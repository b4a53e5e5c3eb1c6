import { useState } from 'react';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { ActuatorFacts } from './actuator-facts.tsx';
import { HighVoltageMarker, isHighVoltage } from './high-voltage.tsx';
import { RunCards } from './run-cards.tsx';
import { RunDetails } from './run-details.tsx';
import { RunPlot } from './run-plot.tsx';
import { RunTable } from './run-table.tsx';
import { DriveMatrixPanel } from './drive-matrix-panel.tsx';
import { LinearisationPanel } from './linearisation-panel.tsx';
import { WorkbenchLinks } from './workbench-links.tsx';

/** One actuator: what it is and how it is driven, its calibration runs, and the plot of the chosen run. */
export function ActuatorCard({ actuator }: { actuator: ActuatorDto }) {
  const [chosen, setChosen] = useState<number | undefined>(undefined);
  const name = actuator.label || actuator.part.name;
  const selected = actuator.runs.find((r) => r.id === chosen) ?? actuator.runs[0];
  const headingId = `actuator-${actuator.id}`;
  return (
    <article aria-labelledby={headingId} className="space-y-4 rounded-lg border border-rule bg-white p-4">
      <h3 id={headingId} className="flex flex-wrap items-baseline gap-2 text-lg font-semibold">
        {name}
        <span className="num rounded bg-teal/10 px-1.5 text-sm font-medium text-teal-dark">{actuator.axis}</span>
      </h3>
      <ActuatorFacts actuator={actuator} />
      {isHighVoltage(actuator) && <HighVoltageMarker actuator={actuator} />}
      {actuator.notes && <p className="whitespace-pre-line text-sm">{actuator.notes}</p>}
      {actuator.driveMatrix && <DriveMatrixPanel matrix={actuator.driveMatrix} />}
      {actuator.linearisation && <LinearisationPanel actuatorId={actuator.id} lin={actuator.linearisation} />}
      <WorkbenchLinks actuator={actuator} />
      <div className="space-y-3">
        <h4 className="text-sm font-semibold">Calibration runs</h4>
        {selected ? (
          <>
            <div className="hidden sm:block">
              <RunTable
                runs={actuator.runs}
                actuatorName={name}
                groupId={`runs-${actuator.id}`}
                selectedId={selected.id}
                onSelect={setChosen}
              />
            </div>
            <div className="sm:hidden">
              <RunCards runs={actuator.runs} group={`runs-phone-${actuator.id}`} selectedId={selected.id} onSelect={setChosen} />
            </div>
            <RunPlot key={selected.id} run={selected} actuatorName={name} />
            <RunDetails run={selected} expected={actuator.expectedGain} />
          </>
        ) : (
          <p className="text-sm text-ink-soft">No calibration runs yet.</p>
        )}
      </div>
    </article>
  );
}
