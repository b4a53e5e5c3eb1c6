// The run vocabulary (methods, kinds, statuses, size limits and their words), apart from the zod schemas so a page
// that only names a run's method does not load the validation library.

export const RUN_METHODS = ['indicator', 'capacitive', 'interferometer', 'optical-lever', 'reference-sample'] as const;
export type RunMethod = (typeof RUN_METHODS)[number];
export const RUN_STATUSES = ['pending', 'accepted', 'rejected'] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

/**
 * How a run was recorded: calibration points, one peak-to-peak reading of a sine drive, a sampled sine record, or
 * the lattice of a reference sample read off a scan image (lateral axes).
 */
export const RUN_KINDS = ['points', 'peak-to-peak', 'sine-record', 'lattice'] as const;
export type RunKind = (typeof RUN_KINDS)[number];

/** Most points or samples one run may hold (the raw record; pages show a decimated series). */
export const MAX_RUN_POINTS = 200_000;
/** Most points and samples all runs of one build may hold together. */
export const MAX_BUILD_POINTS = 2_000_000;
/** Most runs one build may hold, so a build page stays small whatever its runs hold. */
export const MAX_BUILD_RUNS = 100;

export const runMethodLabels: Record<RunMethod, string> = {
  indicator: 'Dial or electronic indicator',
  capacitive: 'Capacitive sensor',
  interferometer: 'Interferometer',
  'optical-lever': 'Optical lever',
  'reference-sample': 'Reference sample (known step or lattice)',
};

export const runKindLabels: Record<RunKind, string> = {
  points: 'Calibration points',
  'peak-to-peak': 'Peak-to-peak reading',
  'sine-record': 'Sine record',
  lattice: 'Lattice image',
};
