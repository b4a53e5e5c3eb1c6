import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';
import { Suspense, useState } from 'react';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { actuatorDriveLabels } from '@shared/schemas/actuator-vocabulary.ts';
import { partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { useDeleteActuator, useUpdateActuator } from '../../api/actuators.ts';
import { LazyActuatorForm } from './lazy-forms.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { sig } from './format.ts';
import { LazyRunForm } from './lazy-forms.ts';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { StoredRun } from './stored-run.tsx';
import { DriveMatrixPanel } from '../read/drive-matrix-panel.tsx';
import { LinearisationPanel } from '../read/linearisation-panel.tsx';
import { WorkbenchLinks } from '../read/workbench-links.tsx';
import { useClearDriveMatrix } from '../../api/drive-matrix.ts';

/** One actuator: what it is and how it is driven, its calibration runs, and a form for the next run. */
export function ActuatorCard({ actuator }: { actuator: ActuatorDto }) {
  const [editing, setEditing] = useState(false);
  const [addingRun, setAddingRun] = useState(false);
  const update = useUpdateActuator();
  const remove = useDeleteActuator();
  const clearMatrix = useClearDriveMatrix();
  const a = actuator;
  const name = a.label || a.part.name;
  const facts = [`Axis ${a.axis}`, actuatorDriveLabels[a.drive], a.amplifier, a.maxVolts !== null ? `max ${sig(a.maxVolts)} V` : null]
    .filter(Boolean)
    .join(' · ');

  return (
    <li className="rounded-md border border-rule bg-paper/40 p-2 sm:p-3" aria-labelledby={`actuator-${a.id}-name`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 id={`actuator-${a.id}-name`} className="font-semibold">
            {name}
          </h3>
          <p className="text-sm text-ink-soft">
            {a.label && <>{a.part.name} · </>}
            {partCategoryLabels[a.part.category]}
          </p>
          <p className="text-sm">{facts}</p>
          {a.expectedGain && (
            <p className="text-xs text-ink-soft">
              Expected from geometry:{' '}
              <span className="num">
                {sig(a.expectedGain.lowNmPerV)}–{sig(a.expectedGain.highNmPerV)} nm/V
              </span>{' '}
              ({a.expectedGain.basis})
            </p>
          )}
          <p className="text-xs text-ink-soft">
            For a rig posting runs with a token: actuator id <span className="num text-ink">{a.id}</span> (
            <Link className="underline" to={paths.apiReference}>
              how
            </Link>
            )
          </p>
        </div>
        {!editing && (
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" onClick={() => setEditing(true)} aria-label={`Edit actuator ${name}`}>
              Edit
            </Button>
            <ConfirmButton
              label="Delete"
              ariaLabel={`Delete actuator ${name}`}
              question="Delete this actuator and its runs?"
              confirmLabel="Yes, delete"
              disabled={remove.isPending}
              onConfirm={() => remove.mutate(a.id)}
            />
          </div>
        )}
      </div>
      {remove.error && (
        <p role="alert" className="mt-2 text-sm text-danger">
          {errorMessage(remove.error)}
        </p>
      )}
      {editing && (
        <div className="mt-3">
          <Suspense fallback={<p className="text-sm text-ink-soft">Opening the form…</p>}>
            <LazyActuatorForm
              idPrefix={`actuator-${a.id}`}
              actuator={a}
              submitLabel="Save actuator"
              onCancel={() => setEditing(false)}
              onSave={async (values) => {
                await update.mutateAsync({ actuatorId: a.id, ...values });
                setEditing(false);
              }}
            />
          </Suspense>
        </div>
      )}
      <div className="mt-3 space-y-2">
        <WorkbenchLinks actuator={a} />
        {a.driveMatrix && (
          <>
            <DriveMatrixPanel matrix={a.driveMatrix} />
            <ConfirmButton
              label="Remove the saved matrix"
              ariaLabel={`Remove the saved drive matrix of ${name}`}
              question="Remove the drive matrix saved on this actuator?"
              confirmLabel="Yes, remove"
              disabled={clearMatrix.isPending}
              onConfirm={() => clearMatrix.mutate(a.id)}
            />
            {clearMatrix.error && (
              <p role="alert" className="text-sm text-danger">
                {errorMessage(clearMatrix.error)}
              </p>
            )}
          </>
        )}
        {a.linearisation && <LinearisationPanel actuatorId={a.id} lin={a.linearisation} />}
        {a.axis === 'XY' && !a.driveMatrix && (
          <p className="text-xs text-ink-soft">
            An XY pair can keep its drive matrix: fit it on the two-axis mixer and save it onto this actuator.
          </p>
        )}
      </div>
      <h4 className="mb-2 mt-4 text-sm font-semibold">Calibration runs</h4>
      {a.runs.length === 0 && !addingRun && <p className="mb-2 text-sm text-ink-soft">No calibration runs yet.</p>}
      <ul className="space-y-2">
        {a.runs.map((r) => (
          <StoredRun key={r.id} run={r} maxVolts={a.maxVolts} />
        ))}
      </ul>
      <div className="mt-3">
        {addingRun ? (
          <Suspense fallback={<p className="text-sm text-ink-soft">Opening the run form…</p>}>
            <LazyRunForm
              actuatorId={a.id}
              maxVolts={a.maxVolts}
              flagContext={{ expectedGainNmPerV: a.expectedGain?.gainNmPerV ?? null, partMedianNmPerV: a.part.stats.gainMedianNmPerV }}
              onSaved={() => setAddingRun(false)}
              onCancel={() => setAddingRun(false)}
            />
          </Suspense>
        ) : (
          <Button variant="secondary" onClick={() => setAddingRun(true)} aria-label={`Add a calibration run to ${name}`}>
            Add a calibration run
          </Button>
        )}
      </div>
    </li>
  );
}
