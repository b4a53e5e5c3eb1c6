import type { BuildDto } from '@shared/schemas/build.ts';
import { useUpdateBuild } from '../../api/update-build.ts';
import { BuildDetailsForm } from './build-details-form.tsx';
import { EditorNav } from './editor-nav.tsx';
import { EditorSection } from './editor-section.tsx';
import { EntriesSection } from './entries-section.tsx';
import { PhotosSection } from './photos-section.tsx';
import { ActuatorsSection } from './actuators-section.tsx';
import { ReviewSection } from './review-section.tsx';
import { StatusNotice } from './status-notice.tsx';

/** The owner's editor: details, log entries, photos, actuators with their runs, and review. */
export function BuildEditor({ build }: { build: BuildDto }) {
  const update = useUpdateBuild(build.id);
  if (!build.abilities.edit) return <StatusNotice build={build} />;
  return (
    <div>
      <EditorNav />
      <div className="space-y-6">
        <StatusNotice build={build} />
        <EditorSection id="details" title="Details">
          <BuildDetailsForm
            defaults={{
              title: build.title,
              instrumentKind: build.instrumentKind,
              stage: build.stage,
              summary: build.summary,
              body: build.body,
            }}
            submitLabel="Save details"
            savedMessage="Details saved."
            photos={build.photos}
            onSave={(values) => update.mutateAsync(values)}
          />
        </EditorSection>
        <EntriesSection build={build} />
        <PhotosSection build={build} />
        <ActuatorsSection build={build} />
        <ReviewSection build={build} />
      </div>
    </div>
  );
}
