// The build vocabulary (kinds, stages, statuses and their words), apart from the zod schemas so a page that only
// names a status does not load the validation library.
export const INSTRUMENT_KINDS = [
  'tunnelling-microscope',
  'force-microscope',
  'profilometer',
  'positioning-stage',
  'manipulator',
  'other',
] as const;
export type InstrumentKind = (typeof INSTRUMENT_KINDS)[number];
export const BUILD_STAGES = ['planning', 'assembling', 'first-signal', 'working', 'retired'] as const;
export type BuildStage = (typeof BUILD_STAGES)[number];
export const BUILD_STATUSES = ['draft', 'submitted', 'published', 'returned', 'declined'] as const;
export type BuildStatus = (typeof BUILD_STATUSES)[number];

export const instrumentKindLabels: Record<InstrumentKind, string> = {
  'tunnelling-microscope': 'Tunnelling microscope',
  'force-microscope': 'Force microscope',
  profilometer: 'Profilometer',
  'positioning-stage': 'Positioning stage',
  manipulator: 'Manipulator',
  other: 'Other instrument',
};
export const buildStageLabels: Record<BuildStage, string> = {
  planning: 'Planning',
  assembling: 'Assembling',
  'first-signal': 'First signal',
  working: 'Working',
  retired: 'Retired',
};
export const buildStatusLabels: Record<BuildStatus, string> = {
  draft: 'Draft',
  submitted: 'Pending review',
  published: 'Published',
  returned: 'Returned with notes',
  declined: 'Declined',
};
