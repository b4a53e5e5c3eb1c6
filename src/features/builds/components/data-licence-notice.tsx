import { Button } from '@/components/ui/button.tsx';
import { FormError, errorMessage } from '@/components/ui/form-bits.tsx';
import { useAcceptDataLicence, useDataLicence } from '../api/data-licence.ts';

/**
 * Asked once, where makers add runs: the measurements they contribute are published under the data licence.
 * Runs are stored either way; nothing shows for visitors or once accepted.
 */
export function DataLicenceNotice() {
  const state = useDataLicence();
  const accept = useAcceptDataLicence();
  if (!state.data || state.data.acceptedAt) return null;
  const { licence } = state.data;
  return (
    <section aria-label="Data licence" className="rounded-md border border-l-4 border-teal/40 bg-teal/5 p-3 text-sm">
      <p>
        Calibration runs you add are published as open data under{' '}
        <a href={licence.url} rel="license noreferrer" target="_blank" className="text-teal-dark underline">
          {licence.name} ({licence.id})
        </a>
        : anyone may reuse them, crediting “{licence.attribution}” and you. We ask once.
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <Button variant="secondary" disabled={accept.isPending} onClick={() => accept.mutate()}>
          {accept.isPending ? 'Saving…' : 'I agree'}
        </Button>
        <FormError message={accept.error ? errorMessage(accept.error) : undefined} />
      </div>
    </section>
  );
}
