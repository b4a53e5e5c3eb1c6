import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { useCreateBuild } from '@/features/builds/api/create-build.ts';
import { BuildDetailsForm } from '@/features/builds/components/editor/build-details-form.tsx';
import { SignInToEdit } from '@/features/builds/components/editor/editor-access.tsx';

/** Start a build: the details become a draft, then the editor opens for entries, photos and actuators. */
export function BuildNewPage() {
  const { data: session } = useSession();
  const navigate = useNavigate();
  const create = useCreateBuild();

  if (session && !session.user) return <SignInToEdit title="New build" returnTo={paths.newBuild} />;
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader
        title="New build"
        lead="Start with the essentials. It is saved as a draft that only you can see; log entries, photos, actuators and calibration runs come next."
      />
      <BuildDetailsForm
        submitLabel="Create draft"
        onSave={async (values) => {
          const build = await create.mutateAsync(values);
          navigate(paths.editBuild(build.id));
        }}
      />
    </div>
  );
}
