// The demo community's parts (invented): what the registry lists. Every number is invented; none is a measurement.
import type { PartCategory } from '@shared/schemas/part-vocabulary.ts';

export interface DemoPart {
  key: string;
  category: PartCategory;
  name: string;
  salvageSource: string;
  material: string | null;
  lengthMm?: number;
  widthMm?: number;
  thicknessMm?: number;
  outerDiameterMm?: number;
  wallMm?: number;
  layers?: number;
  capacitanceNf?: number;
  safeVolts?: number;
  notes: string;
  status: 'accepted' | 'proposed';
  proposedBy: string;
  pictures?: DemoPicture[];
}

/** A drawn picture: a caption (the alt text) and a scene to draw (see demo-pictures.ts). */
export interface DemoPicture {
  alt: string;
  scene: 'bench' | 'head' | 'plot' | 'stage' | 'bar' | 'disc' | 'tube';
}

export const DEMO_PARTS: DemoPart[] = [
  {
    key: 'cartridge-bar',
    category: 'bimorph',
    // Invented geometry: a 9.4 mm free length and 0.57 mm thickness of PZT-5A predict about 70 nm/V as a
    // series bimorph (the expected-gain page); the demo runs on it scatter around that (demo-builds.ts).
    name: 'Cartridge bimorph bar 9.4 × 1.6 × 0.57 mm',
    salvageSource: 'a shoebox of dead ceramic phono cartridges from a repair-café spares shelf (the two-wire bar under the stylus bridge)',
    material: 'PZT-5A',
    lengthMm: 9.4,
    widthMm: 1.6,
    thicknessMm: 0.57,
    capacitanceNf: 0.46,
    safeVolts: 60,
    status: 'accepted',
    proposedBy: 'marit-builds',
    pictures: [{ alt: 'One bar on a millimetre rule, electrode faces up, two thin leads at the clamped end', scene: 'bar' }],
    notes:
      'Material is a guess: the ceramic is unmarked. Free length measured from the clamp to the tip. Desolder quickly; the bars depole if heated.',
  },
  {
    key: 'buzzer-27',
    category: 'buzzer-disc',
    name: 'Brass buzzer disc 27 mm',
    salvageSource: 'smoke alarms, kitchen timers',
    material: null,
    outerDiameterMm: 27,
    thicknessMm: 0.54,
    capacitanceNf: 22,
    safeVolts: 30,
    status: 'accepted',
    proposedBy: 'tunnel-rohan',
    pictures: [{ alt: 'Buzzer disc from above: brass rim around the silvered ceramic, two leads soldered on', scene: 'disc' }],
    notes: 'Unimorph: ceramic on a brass plate. Centre displacement depends heavily on how the rim is clamped.',
  },
  {
    key: 'stack-5x5',
    category: 'stack',
    name: 'Multilayer stack 5 × 5 × 9 mm',
    salvageSource: 'surplus optical mounts',
    material: 'PZT-5H',
    lengthMm: 9,
    widthMm: 5,
    thicknessMm: 5,
    layers: 90,
    capacitanceNf: 800,
    safeVolts: 100,
    status: 'accepted',
    proposedBy: 'stage-kwame',
    notes: 'Layer count estimated from a cracked sibling under a loupe. Keep it under preload; stacks dislike tension.',
  },
  {
    key: 'tube-635',
    category: 'tube',
    name: 'Quartered tube 6.35 OD × 12.7 mm',
    salvageSource: 'surplus scanner heads',
    material: 'PZT-5H',
    lengthMm: 12.7,
    outerDiameterMm: 6.35,
    wallMm: 0.5,
    capacitanceNf: 3.1,
    safeVolts: 150,
    status: 'accepted',
    proposedBy: 'tunnel-rohan',
    pictures: [
      { alt: 'The tube standing on end; three of its four outer electrodes face the camera, marked X+, Y+ and X−', scene: 'tube' },
    ],
    notes: 'Four outer electrodes, one inner. Scratch the outer silver carefully if you have to re-cut quadrants.',
  },
  {
    key: 'humidifier-20',
    category: 'buzzer-disc',
    name: 'Ultrasonic humidifier disc 20 mm',
    salvageSource: 'mist makers',
    material: null,
    outerDiameterMm: 20,
    thicknessMm: 1.0,
    capacitanceNf: 2.2,
    safeVolts: 50,
    status: 'proposed',
    proposedBy: 'bimorph-bea',
    notes: 'Thick ceramic, no brass. Proposed so others can log what it does off resonance.',
  },
];
