import { useLocation } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { paths } from '@/config/paths.ts';

/**
 * What a workbench result shows under it before the "Record as a run" form opens: a visitor gets a sign-in line, a
 * signed-in maker a button that opens the form (its code loads then).
 */
export function RecordRunInvite({ signedIn, ready, onOpen }: { signedIn: boolean; ready: boolean; onOpen?: () => void }) {
  const location = useLocation();
  if (!signedIn) {
    return (
      <section aria-label="Record as a run" className="rounded-lg border border-dashed border-rule bg-white p-4 text-sm">
        <p>
          Measured this on your own instrument?{' '}
          <a className="text-teal-dark underline" href={paths.signIn(location.pathname + location.search)}>
            Sign in
          </a>{' '}
          to record it as a calibration run of one of your builds.
        </p>
      </section>
    );
  }
  return (
    <section
      aria-label="Record as a run"
      className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-rule bg-white p-4"
    >
      <p className="text-sm">Measured on your own instrument? Keep it with the build it belongs to.</p>
      <Button variant="secondary" disabled={!ready} onClick={onOpen}>
        Record as a run…
      </Button>
    </section>
  );
}
