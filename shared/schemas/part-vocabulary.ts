// The part vocabulary (categories, statuses and their words), apart from the zod schemas.

export const PART_CATEGORIES = ['bimorph', 'buzzer-disc', 'stack', 'tube', 'shear-plate', 'voice-coil', 'other'] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];
export const PART_STATUSES = ['proposed', 'accepted', 'rejected'] as const;
export type PartStatus = (typeof PART_STATUSES)[number];

export const partCategoryLabels: Record<PartCategory, string> = {
  bimorph: 'Bimorph bender',
  'buzzer-disc': 'Buzzer disc',
  stack: 'Multilayer stack',
  tube: 'Piezo tube',
  'shear-plate': 'Shear plate',
  'voice-coil': 'Voice coil',
  other: 'Other',
};
