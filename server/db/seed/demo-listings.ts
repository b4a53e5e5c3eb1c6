// The demo community's exchange listings (invented).
import type { DemoPicture } from './demo-parts.ts';

export interface DemoListing {
  owner: string;
  part: string;
  kind: 'offering' | 'seeking';
  quantity: number;
  condition: 'new' | 'salvaged-tested' | 'salvaged-untested';
  priceKind: 'price' | 'free' | 'swap';
  priceAmount?: number;
  currency?: string;
  region: string;
  shipsTo?: string;
  notes: string;
  status?: 'open' | 'reserved' | 'closed';
  pictures?: DemoPicture[];
}

export const DEMO_LISTINGS: DemoListing[] = [
  {
    owner: 'marit-builds',
    part: 'cartridge-bar',
    kind: 'offering',
    quantity: 3,
    condition: 'salvaged-tested',
    priceKind: 'price',
    priceAmount: 4,
    currency: 'EUR',
    region: 'Lower Saxony',
    shipsTo: 'EU',
    notes: 'Freed from their rubber, each measured at 0.43–0.49 nF. Small chips on one end of one bar.',
    pictures: [{ alt: 'The three bars offered, side by side on a millimetre rule', scene: 'bar' }],
  },
  {
    owner: 'tunnel-rohan',
    part: 'buzzer-27',
    kind: 'offering',
    quantity: 10,
    condition: 'salvaged-untested',
    priceKind: 'free',
    region: 'Leeds',
    shipsTo: 'UK',
    notes: 'A bag of discs from old alarms. Leads still attached on most.',
    pictures: [{ alt: 'One of the discs in the bag, leads still attached', scene: 'disc' }],
  },
  {
    owner: 'demo-maker',
    part: 'tube-635',
    kind: 'seeking',
    quantity: 1,
    condition: 'salvaged-tested',
    priceKind: 'swap',
    region: 'Utrecht',
    shipsTo: 'anywhere',
    notes: 'Looking for a quartered tube for a first STM; can swap a small HV supply board.',
  },
  {
    owner: 'stage-kwame',
    part: 'stack-5x5',
    kind: 'offering',
    quantity: 2,
    condition: 'salvaged-tested',
    priceKind: 'price',
    priceAmount: 15,
    currency: 'USD',
    region: 'Accra',
    shipsTo: 'worldwide',
    notes: 'Two spares from the same batch as the stage build.',
    status: 'reserved',
  },
];
