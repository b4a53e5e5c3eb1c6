/** The workbench calculators in the order the index lists them; `slug` is the page's URL segment. */
export const workbenchTools = [
  { slug: 'fit', title: 'Gain fit', line: 'nm/V from a calibration run, with its 95 % interval, R², nonlinearity and hysteresis.' },
  {
    slug: 'peak-to-peak',
    title: 'Peak-to-peak gain',
    line: 'Gain from a sine drive read at its peaks, limited by the reading resolution.',
  },
  {
    slug: 'sine-fit',
    title: 'Sine recording',
    line: 'Gain and phase lag from a recorded sine drive and displacement (IEEE 1057 sine fit), with the loop plotted.',
  },
  {
    slug: 'linearise',
    title: 'Linearise the drive',
    line: 'A curve per sweep branch and the table of volts that puts the actuator where you want it (CSV or C array).',
  },
  {
    slug: 'lattice',
    title: 'Scale from a lattice image',
    line: 'Pixel size in x and y, axis skew, rotation and lateral gains read off an image of graphite or a grating.',
  },
  { slug: 'creep', title: 'Creep', line: 'Fit the logarithmic creep after a voltage step and project it to later times.' },
  {
    slug: 'expected-gain',
    title: 'Expected gain',
    line: 'What a bender, tube, stack or shear plate should give from its geometry and material.',
  },
  {
    slug: 'mixing',
    title: 'Two-axis mixer',
    line: 'Drive matrix for a pair of benders, volts for a wanted x, y, and the reachable region.',
  },
  { slug: 'scan-planner', title: 'Scan planner', line: 'DAC step and range, frame time and line-rate ceilings for your drive chain.' },
  {
    slug: 'resonance',
    title: 'Cantilever resonance',
    line: 'First bending mode of a bender or lever, with a tip mass, and its spring constant.',
  },
  { slug: 'drive-current', title: 'Drive current', line: 'Peak and RMS current, reactive power and stored charge of a piezo load.' },
  { slug: 'tunnelling', title: 'Tunnelling gap', line: 'Decay constant and current change per ångström from the barrier height.' },
  { slug: 'units', title: 'Units', line: 'Convert nm, µm, Å, µin and mil; V and mV.' },
  {
    slug: 'loaded-gain',
    title: 'Loaded gain',
    line: 'What an actuator keeps against a spring such as a dial indicator, and how far its preload pushes it back.',
  },
  { slug: 'tube', title: 'Piezo tube', line: 'Quadrant capacitance and the first bending and axial resonances of a quartered tube.' },
  {
    slug: 'drive-limits',
    title: 'Drive limits',
    line: 'Slew rate and current a sine or raster asks of the amplifier, and the frequencies its limits allow.',
  },
  {
    slug: 'noise-floor',
    title: 'Noise floor',
    line: 'Amplifier noise, DAC steps and cantilever thermal motion at the tip, and which one dominates.',
  },
] as const;

/** One calculator's URL segment. */
export type WorkbenchSlug = (typeof workbenchTools)[number]['slug'];

/** The title of a calculator, for breadcrumbs and headings. */
export const toolTitle = (slug: WorkbenchSlug) => workbenchTools.find((t) => t.slug === slug)!.title;
