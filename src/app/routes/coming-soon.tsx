import { PageHeader } from '@/components/ui/page-header.tsx';

function ComingSoon({ title, what }: { title: string; what: string }) {
  return (
    <div>
      <PageHeader title={title} />
      <div className="rounded-lg border border-dashed border-rule bg-white p-6">
        <p className="font-medium">Not built yet.</p>
        <p className="mt-1 text-ink-soft">{what}</p>
      </div>
    </div>
  );
}

export const PartsComingSoon = () => (
  <ComingSoon title="Parts registry" what="The registry of salvaged transducers, searchable by measured nm/V, is coming in a later release. Nothing here works yet." />
);
export const ExchangeComingSoon = () => (
  <ComingSoon title="Exchange" what="Listings for offering and seeking spare parts are coming in a later release. Nothing here works yet." />
);
export const ReviewComingSoon = () => (
  <ComingSoon title="Review desk" what="The moderators' queue for builds, calibration runs, proposed parts and reports is coming in a later release." />
);
