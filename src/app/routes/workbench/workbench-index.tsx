import { PageHeader } from '@/components/ui/page-header.tsx';

export function WorkbenchIndexPage() {
  return (
    <div>
      <PageHeader title="Workbench" lead="Calculators for calibration fits, expected gain, two-axis mixing, scan planning, resonance, drive current and tunnelling." />
      <p className="rounded-lg border border-dashed border-rule bg-white p-6 text-ink-soft">The calculators are being built and are not available yet.</p>
    </div>
  );
}
