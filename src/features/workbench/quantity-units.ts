// Units the workbench's quantity pickers offer, each with its factor to the SI unit, so the forms
// convert typed values into the shared schemas' SI inputs and convert the numbers when a unit changes.

/** Farads per unit of a capacitance picker. */
export const faradsPer = { nF: 1e-9, uF: 1e-6 } as const;

/** Hertz per unit of a frequency picker. */
export const hertzPer = { Hz: 1, kHz: 1e3 } as const;

/** Capacitance picker: nF or µF. */
export const capacitanceUnits = [
  { value: 'nF', label: 'nF', factor: faradsPer.nF },
  { value: 'uF', label: 'µF', factor: faradsPer.uF },
] as const;

/** Frequency picker: Hz or kHz. */
export const frequencyUnits = [
  { value: 'Hz', label: 'Hz', factor: hertzPer.Hz },
  { value: 'kHz', label: 'kHz', factor: hertzPer.kHz },
] as const;
