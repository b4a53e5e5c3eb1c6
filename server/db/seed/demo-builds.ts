// The demo community's builds (invented): entries, actuators and calibration runs. Every number is invented;
// none is a measurement.
import type { BuildStage, BuildStatus, InstrumentKind } from '@shared/schemas/build-vocabulary.ts';
import type { ActuatorAxis, ActuatorDrive } from '@shared/schemas/actuator-vocabulary.ts';
import type { RunMethod, RunStatus } from '@shared/schemas/run-vocabulary.ts';
import type { DemoPicture } from './demo-parts.ts';

export interface DemoRun {
  status: RunStatus;
  method: RunMethod;
  /** Invented true gain, hysteresis fraction and noise (nm) used to generate the points. */
  gainNmPerV: number;
  loopFraction: number;
  noiseNm: number;
  maxVolts: number;
  steps: number;
  displacementUnit: 'nm' | 'um' | 'uin';
  reviewNote?: string;
  daysAgo: number;
}

export interface DemoActuator {
  part: string;
  label: string;
  axis: ActuatorAxis;
  drive: ActuatorDrive;
  amplifier?: string;
  maxVolts?: number;
  runs: DemoRun[];
}

export interface DemoBuild {
  owner: string;
  title: string;
  instrumentKind: InstrumentKind;
  stage: BuildStage;
  status: BuildStatus;
  summary: string;
  body: string;
  daysAgo: number;
  reviewNote?: string;
  editedSinceReview?: boolean;
  entries: { daysAgo: number; title: string; body: string }[];
  actuators: DemoActuator[];
  /** Drawn pictures for the gallery: a caption and a scene to draw. */
  pictures: DemoPicture[];
}

const run = (over: Partial<DemoRun> & Pick<DemoRun, 'gainNmPerV'>): DemoRun => ({
  status: 'accepted',
  method: 'indicator',
  loopFraction: 0.06,
  noiseNm: 8,
  maxVolts: 40,
  steps: 9,
  displacementUnit: 'nm',
  daysAgo: 20,
  ...over,
});

export const DEMO_BUILDS: DemoBuild[] = [
  {
    owner: 'marit-builds',
    title: 'Beam-deflection AFM on a slate offcut',
    instrumentKind: 'force-microscope',
    stage: 'first-signal',
    status: 'published',
    daysAgo: 60,
    summary: 'Optical-lever force microscope with two cartridge bimorphs as the XY scanner and a quartered tube for Z.',
    body:
      '## Why\n\nI wanted to see the grooves of a blank CD without borrowing lab time.\n\n## Mechanics\n\n- Base: a ' +
      '20 mm slate offcut on squash balls\n- Scanner: two **cartridge bimorph bars** meeting at 90°, driven as an ' +
      'anti-phase pair\n- Z: a quartered tube, all quadrants together\n\n| part | role |\n|---|---|\n| cartridge bar ' +
      '× 2 | XY |\n| quartered tube | Z |\n\n## Status\n\n- [x] optical lever aligned\n- [x] first force curve\n- [ ] ' +
      'first image that is not drift\n',
    entries: [
      {
        daysAgo: 55,
        title: 'Bars out of their cartridges',
        body: 'Two cartridges gave four bars; one cracked while freeing it from the rubber. Measured **0.46 nF** on the survivors.',
      },
      {
        daysAgo: 40,
        title: 'Calibrating X with the dial indicator',
        body: 'Dial indicator with 0.1 µm resolution on a lever with 10:1 reduction. Up and down sweeps, 5 V steps. Loop is visible but small.',
      },
      { daysAgo: 12, title: 'First force curve', body: 'Snap-in clearly visible at about 30 nm. Drift is the next enemy.' },
    ],
    actuators: [
      {
        part: 'cartridge-bar',
        label: 'X bender',
        axis: 'X',
        drive: 'pair-anti-phase',
        amplifier: 'op-amp booster, ±45 V rails',
        maxVolts: 40,
        runs: [
          run({ gainNmPerV: 71.6, loopFraction: 0.09, daysAgo: 38 }),
          run({ gainNmPerV: 68.3, loopFraction: 0.11, daysAgo: 30, displacementUnit: 'um' }),
        ],
      },
      {
        part: 'cartridge-bar',
        label: 'Y bender',
        axis: 'Y',
        drive: 'pair-anti-phase',
        amplifier: 'op-amp booster, ±45 V rails',
        maxVolts: 40,
        runs: [run({ gainNmPerV: 73.4, loopFraction: 0.1, daysAgo: 36 })],
      },
      {
        part: 'tube-635',
        label: 'Z tube',
        axis: 'Z',
        drive: 'single',
        amplifier: 'HV amplifier, 0–150 V',
        maxVolts: 150,
        runs: [run({ gainNmPerV: 5.8, loopFraction: 0.1, noiseNm: 4, maxVolts: 120, method: 'interferometer', daysAgo: 25 })],
      },
    ],
    pictures: [
      { alt: 'The force microscope on its slate base, laser on the left, photodiode on the right', scene: 'bench' },
      { alt: 'Close-up of the two bimorph bars meeting at the tip holder', scene: 'head' },
    ],
  },
  {
    owner: 'tunnel-rohan',
    title: 'Tube-scanner STM in a biscuit tin',
    instrumentKind: 'tunnelling-microscope',
    stage: 'working',
    status: 'published',
    daysAgo: 120,
    summary: 'A classic tube-scanner STM with a buzzer-disc coarse approach, imaging graphite steps.',
    body:
      '## Head\n\nQuartered tube for XY, inner electrode for Z. Coarse approach with a **buzzer disc** pushing a fine ' +
      'screw.\n\n## Electronics\n\nTransimpedance 100 MΩ, 16-bit DACs, HV stage for the tube.\n\n> High voltage on ' +
      'the tube electrodes: the whole head sits in an earthed tin and the amplifier has bleeder resistors.\n',
    entries: [
      { daysAgo: 110, title: 'Tube quadrants tested', body: 'All four quadrants within 3 % capacitance of each other.' },
      {
        daysAgo: 80,
        title: 'Graphite steps',
        body: 'Steps on freshly cleaved graphite. Used the 0.335 nm layer step to check the Z gain.',
      },
    ],
    actuators: [
      {
        part: 'tube-635',
        label: 'XY scan tube',
        axis: 'XY',
        drive: 'quartered-tube',
        amplifier: 'HV amplifier ±150 V',
        maxVolts: 150,
        runs: [
          run({ gainNmPerV: 11.8, method: 'reference-sample', noiseNm: 1.5, maxVolts: 140, loopFraction: 0.12, daysAgo: 90 }),
          run({ gainNmPerV: 12.6, method: 'reference-sample', noiseNm: 1.5, maxVolts: 140, daysAgo: 70 }),
        ],
      },
      {
        part: 'buzzer-27',
        label: 'Coarse approach disc',
        axis: 'Z',
        drive: 'single',
        amplifier: '12 V driver',
        maxVolts: 24,
        runs: [
          run({ gainNmPerV: 31, maxVolts: 24, noiseNm: 12, daysAgo: 95 }),
          run({
            gainNmPerV: 140,
            status: 'rejected',
            reviewNote: 'Gain is about 4–5× every other disc of this kind; the indicator was probably on the lever, not the disc centre.',
            daysAgo: 60,
          }),
        ],
      },
    ],
    pictures: [
      { alt: 'The STM head inside its tin, tube scanner in the middle', scene: 'head' },
      { alt: 'Graphite steps: line profile across three terraces', scene: 'plot' },
    ],
  },
  {
    owner: 'bimorph-bea',
    title: 'Stylus profilometer from a record-player arm',
    instrumentKind: 'profilometer',
    stage: 'assembling',
    status: 'submitted',
    daysAgo: 15,
    summary: 'A stylus profilometer that keeps the original arm and uses a cartridge bimorph as the height sensor actuator.',
    body: 'Work in progress. The arm pivot is surprisingly good; the bimorph nulls the stylus force.\n',
    entries: [{ daysAgo: 10, title: 'First calibration', body: 'Stepped the bimorph in 4 V steps against a dial indicator.' }],
    actuators: [
      {
        part: 'cartridge-bar',
        label: 'Force-null bender',
        axis: 'Z',
        drive: 'single',
        maxVolts: 30,
        runs: [
          run({ gainNmPerV: 67.2, status: 'pending', maxVolts: 30, noiseNm: 10, loopFraction: 0.12, daysAgo: 9, displacementUnit: 'uin' }),
        ],
      },
    ],
    pictures: [],
  },
  {
    owner: 'stage-kwame',
    title: 'Two-axis bender stage for fibre alignment',
    instrumentKind: 'positioning-stage',
    stage: 'working',
    status: 'published',
    daysAgo: 90,
    editedSinceReview: true,
    summary: 'A stack-driven flexure stage plus a bender pair for the fine XY trim of a fibre tip.',
    body: '## Layout\n\nFlexure hinges cut from aluminium plate; one multilayer stack per axis under about 20 N preload.\n\nThe bender pair gives a few micrometres of fine trim on top.\n',
    entries: [
      {
        daysAgo: 85,
        title: 'Preload matters',
        body: 'Without preload the stack gain looked 30 % low and wandered. With the spring it settled.',
      },
    ],
    actuators: [
      {
        part: 'stack-5x5',
        label: 'X stack',
        axis: 'X',
        drive: 'single',
        amplifier: '0–100 V linear amplifier',
        maxVolts: 100,
        runs: [run({ gainNmPerV: 44, method: 'capacitive', noiseNm: 5, maxVolts: 100, loopFraction: 0.11, daysAgo: 80 })],
      },
      {
        part: 'stack-5x5',
        label: 'Y stack',
        axis: 'Y',
        drive: 'single',
        amplifier: '0–100 V linear amplifier',
        maxVolts: 100,
        runs: [
          run({ gainNmPerV: 47, method: 'capacitive', noiseNm: 5, maxVolts: 100, loopFraction: 0.09, daysAgo: 79 }),
          run({ gainNmPerV: 46, method: 'capacitive', status: 'pending', maxVolts: 100, daysAgo: 3 }),
        ],
      },
      {
        part: 'cartridge-bar',
        label: 'Fine trim pair',
        axis: 'XY',
        drive: 'pair-in-phase',
        maxVolts: 40,
        runs: [run({ gainNmPerV: 66.9, method: 'optical-lever', loopFraction: 0.07, daysAgo: 70 })],
      },
    ],
    pictures: [{ alt: 'The flexure stage with its two stacks and preload springs', scene: 'stage' }],
  },
  {
    owner: 'stage-kwame',
    title: 'Micromanipulator for pulling glass tips',
    instrumentKind: 'manipulator',
    stage: 'planning',
    status: 'returned',
    daysAgo: 8,
    reviewNote: 'Please add at least one photo or a sketch and say which parts you plan to use, so readers can follow.',
    summary: 'Planning a three-axis manipulator from salvaged stacks.',
    body: 'Plans only so far.\n',
    entries: [],
    actuators: [],
    pictures: [],
  },
  {
    owner: 'demo-maker',
    title: 'My first tunnelling microscope',
    instrumentKind: 'tunnelling-microscope',
    stage: 'planning',
    status: 'draft',
    daysAgo: 2,
    summary: 'Gathering parts for a first STM.',
    body: 'Notes to self: order tungsten wire, find a quartered tube.\n',
    entries: [],
    actuators: [],
    pictures: [],
  },
];
