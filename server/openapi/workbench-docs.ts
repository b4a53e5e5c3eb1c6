// Route table rows (route-docs.ts): the workbench calculators, one route each, and the image decoder.
import { calculators } from '@shared/workbench/calculators/all-calculators.ts';
import { RIG_RUN_BODY } from '@shared/docs/rig-examples.ts';
import { json, type RouteDoc } from './route-doc.ts';

/** What each workbench page computes, by slug; a calculator without a line here is still documented. */
const WORKBENCH_SUMMARIES: Record<string, string> = {
  fit: 'Fit a calibration curve (gain, R², nonlinearity, hysteresis)',
  'peak-to-peak': 'Gain from two peak-to-peak readings, with uncertainty and bounds',
  creep: 'Fit logarithmic creep and project it',
  'expected-gain': 'Expected gain of a bender, stack or tube from its geometry and material',
  mixing: 'Drive voltages for a wanted X/Y displacement through a gain matrix',
  'mixing-fit': 'Fit a two-axis gain matrix from a grid of readings',
  linearise: 'Polynomial per sweep branch and the table of volts that linearises the drive',
  lattice: 'Lateral scale (nm per pixel, skew, rotation, gains) from an image of a lattice of known spacing',
  'scan-plan': 'Step size, range and timing of a raster scan',
  resonance: 'First resonance of a cantilevered bender, with a tip mass',
  'drive-current': 'Peak current to drive a capacitive load with a sine',
  tunnelling: 'Tunnelling current decay per ångström for a barrier height',
  convert: 'Convert displacements, voltages or gains between units',
  'loaded-gain': 'Gain of an actuator working against a spring and preload',
  tube: 'Capacitance, resonance and gain of a piezo tube',
  'drive-limits': 'What an amplifier can drive: current, slew and RC limits',
  'noise-floor': 'Displacement noise floor of a scanner chain',
  'sine-fit': 'Fit a sine drive and displacement record (IEEE Std 1057): gain and phase lag',
};

/** Request examples of the calculators a rig or script is most likely to call. */
const WORKBENCH_EXAMPLES: Record<string, unknown> = {
  fit: { points: RIG_RUN_BODY.points, displacementUnit: 'nm' },
  'peak-to-peak': { displacementPpNm: 8000, voltsPpV: 120, displacementResolutionNm: 1000, voltsResolutionV: 1 },
  'drive-current': { capacitanceF: 1e-6, amplitudeV: 150, frequencyHz: 100 },
  convert: { value: 3, from: 'angstrom/V', to: 'uin/V' },
};

const calculatorDocs: RouteDoc[] = calculators.map((c) => ({
  method: 'POST',
  path: `/api/workbench/${c.slug}`,
  summary: WORKBENCH_SUMMARIES[c.slug] ?? `Workbench calculation: ${c.slug}`,
  description:
    'A pure calculation: nothing is stored and no sign-in or CSRF token is needed. The answer is the figures, warnings and ' +
    'safety cautions the workbench page shows for the same input.',
  tag: 'Workbench',
  auth: 'visitor',
  body: c.input,
  response: json(200, 'The result as the workbench page shows it, with `warnings` and `cautions`.'),
  errors: [413, 429],
  ...(WORKBENCH_EXAMPLES[c.slug] ? { example: WORKBENCH_EXAMPLES[c.slug] } : {}),
}));

const imageHeightsDoc: RouteDoc = {
  method: 'POST',
  path: '/api/workbench/image-heights',
  summary: 'Decode a greyscale PNG or TIFF height image into rows of numbers (for the lattice calculation)',
  description:
    'Nothing is stored. 8- and 16-bit PNG and TIFF, and 32-bit float TIFF; colour becomes the mean of R, G and B. At most 1024 × 1024 ' +
    'pixels (400 `image_too_large`), at least 16 × 16 (`image_too_small`); other formats 415 `unsupported_image`; unreadable files 400 ' +
    '`unreadable_image`. Answers `{ format, width, height, bitDepth, heights }`, the rows ready for POST /api/workbench/lattice.',
  tag: 'Workbench',
  auth: 'visitor',
  multipart: {
    kind: 'image',
    fields: { image: { type: 'binary', description: 'One PNG or TIFF file, at most 8 MB.', required: true } },
  },
  response: json(200, 'The image as rows of numbers, top row first.'),
  errors: [413, 415, 429],
};

/** The workbench calculators, one route each, and the image decoder the lattice page uses. */
export const workbenchDocs: readonly RouteDoc[] = [...calculatorDocs, imageHeightsDoc];
