import { displacementUnitLabels, displacementUnits, gainUnitLabels, gainUnits, voltageUnitLabels, voltageUnits } from '@shared/units.ts';

/** Displacement unit choices for pickers, labelled as every page spells them. */
export const displacementOptions = displacementUnits.map((u) => ({ value: u, label: displacementUnitLabels[u] }));

/** Voltage unit choices for pickers. */
export const voltageOptions = voltageUnits.map((u) => ({ value: u, label: voltageUnitLabels[u] }));

/** Gain unit choices for pickers. */
export const gainOptions = gainUnits.map((u) => ({ value: u, label: gainUnitLabels[u] }));
