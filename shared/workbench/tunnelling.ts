// Tunnelling gap sensitivity: I ∝ exp(−2κd), κ = √(2·m_e·φ)/ħ = 0.5123·√(φ/eV) Å⁻¹
// [memory: 1-D WKB; constants CODATA 2018].

/** Electron mass (kg), CODATA 2018. */
export const ELECTRON_MASS_KG = 9.1093837015e-31;

/** Reduced Planck constant ħ = h/2π (J·s), with h exact in the 2019 SI (CODATA 2018). */
export const REDUCED_PLANCK_J_S = 6.62607015e-34 / (2 * Math.PI);

/** Elementary charge (C), exact in the 2019 SI (CODATA 2018): 1 eV = 1.602176634e-19 J. */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

const METRES_PER_ANGSTROM = 1e-10;

/** κ per √eV in Å⁻¹ (≈ 0.5123), derived from the constants above. */
export const KAPPA_PER_SQRT_EV_PER_ANGSTROM =
  (Math.sqrt(2 * ELECTRON_MASS_KG * ELEMENTARY_CHARGE_C) / REDUCED_PLANCK_J_S) * METRES_PER_ANGSTROM;

/** Decay constant κ (Å⁻¹) for a barrier of height φ (eV). Check [calc]: 4 eV → 1.025 Å⁻¹. */
export function decayConstantPerAngstrom(workFunctionEv: number): number {
  if (!(workFunctionEv > 0)) throw new RangeError('work function must be positive');
  return KAPPA_PER_SQRT_EV_PER_ANGSTROM * Math.sqrt(workFunctionEv);
}

/** Factor by which the current changes per 1 Å of gap: exp(2κ·1 Å). Check [calc]: 4 eV → ×7.8. */
export function currentRatioPerAngstrom(workFunctionEv: number): number {
  return Math.exp(2 * decayConstantPerAngstrom(workFunctionEv));
}

/** Gap change (Å) per decade of current: ln(10)/(2κ); sets how finely the Z loop must resolve. */
export function gapChangePerDecadeAngstrom(workFunctionEv: number): number {
  return Math.LN10 / (2 * decayConstantPerAngstrom(workFunctionEv));
}

/** Barrier height (eV) that gives a wanted current ratio per Å. Check [calc]: ×10 → 5.05 eV. */
export function workFunctionForRatioEv(ratioPerAngstrom: number): number {
  if (!(ratioPerAngstrom > 1)) throw new RangeError('ratio per Å must exceed 1');
  const kappa = Math.log(ratioPerAngstrom) / 2;
  return (kappa / KAPPA_PER_SQRT_EV_PER_ANGSTROM) ** 2;
}
