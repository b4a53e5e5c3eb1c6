// Display helpers for the build pages: dates, gains and the expected-gain basis in our words.
import { EXPECTED_GAIN_SOURCE } from '@shared/workbench/expected-gain.ts';
import type { BuildStatus } from '@shared/schemas/build-vocabulary.ts';
import type { RunStatus } from '@shared/schemas/run-vocabulary.ts';
import type { BadgeTone } from '@/components/ui/status-badge.tsx';

/** Badge colour of each build review state. */
export const buildStatusTone: Record<BuildStatus, BadgeTone> = {
  draft: 'neutral',
  submitted: 'info',
  published: 'success',
  returned: 'caution',
  declined: 'danger',
};

/** Words and colour of each calibration-run review state. */
export const runStatusBadge: Record<RunStatus, { label: string; tone: BadgeTone }> = {
  pending: { label: 'Pending review', tone: 'caution' },
  accepted: { label: 'Accepted', tone: 'success' },
  rejected: { label: 'Rejected', tone: 'danger' },
};

const basisWords: Record<string, string> = {
  'bimorph-series': 'series bimorph',
  'bimorph-parallel': 'parallel bimorph',
  stack: 'multilayer stack',
  'shear-plate': 'shear plate',
  'tube-quadrant': 'tube, one quadrant',
  'tube-opposite-pair': 'tube, opposite quadrants ±V',
  'tube-axial': 'tube, axial',
  'plate-thickness': 'plate, thickness mode',
  'plate-length': 'plate, length mode',
};

/** "series bimorph, PZT-5A · Source: Smits, Dalke & Cooney 1991" from the API's "bimorph-series, PZT-5A". */
export function describeBasis(basis: string): string {
  const [formula, ...rest] = basis.split(', ');
  const source =
    formula && formula in EXPECTED_GAIN_SOURCE ? ` · ${EXPECTED_GAIN_SOURCE[formula as keyof typeof EXPECTED_GAIN_SOURCE]}` : '';
  return `${[basisWords[formula ?? ''] ?? formula, ...rest].join(', ')}${source}`;
}
