import { useState, Suspense } from 'react';
import type { BuildDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { useCreateActuator } from '../../api/actuators.ts';
import { ActuatorCard } from './actuator-card.tsx';
import { LazyActuatorForm } from './lazy-forms.ts';
import { EditorSection } from './editor-section.tsx';
import { DataLicenceNotice } from '../data-licence-notice.tsx';

/** The transducers of the build and the calibration runs measured on each. */
export function ActuatorsSection({ build }: { build: BuildDto }) {
  const [adding, setAdding] = useState(false);
  const create = useCreateActuator(build.id);
  return (
    <EditorSection
      id="actuators"
      title="Actuators and calibration runs"
      lead="Each actuator is a part from the parts registry on an axis. Add calibration runs to record its measured gain in nm/V."
    >
      <div className="mb-3">
        <DataLicenceNotice />
      </div>
      {build.actuators.length === 0 && !adding && <p className="mb-3 text-sm text-ink-soft">No actuators yet.</p>}
      <ul className="space-y-4">
        {build.actuators.map((a) => (
          <ActuatorCard key={a.id} actuator={a} />
        ))}
      </ul>
      <div className="mt-4">
        {adding ? (
          <Suspense fallback={<p className="text-sm text-ink-soft">Opening the form…</p>}>
            <LazyActuatorForm
              idPrefix="new-actuator"
              submitLabel="Add actuator"
              onCancel={() => setAdding(false)}
              onSave={async (values) => {
                await create.mutateAsync(values);
                setAdding(false);
              }}
            />
          </Suspense>
        ) : (
          <Button variant="secondary" onClick={() => setAdding(true)}>
            Add an actuator
          </Button>
        )}
      </div>
    </EditorSection>
  );
}
