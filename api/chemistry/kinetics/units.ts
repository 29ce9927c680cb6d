/** Concentration units of `%units` (step-notation.md); time is always in seconds. */
export type ConcentrationUnit = 'molecule cm^-3' | 'mol L^-1' | 'mol m^-2';

/** Conditions a mechanism is simulated and checked at when %conditions gives none (K, atm). */
export const DEFAULT_TEMPERATURE_K = 298.15;
export const DEFAULT_PRESSURE_ATM = 1;

/** Boltzmann constant, J K⁻¹ (CODATA 2018, exact in the 2019 SI). */
export const BOLTZMANN = 1.380649e-23;
/** Avogadro constant, mol⁻¹ (CODATA 2018, exact in the 2019 SI). */
export const AVOGADRO = 6.02214076e23;
/** One standard atmosphere in Pa (exact by definition). */
export const PASCAL_PER_ATM = 101325;

/** Number density of an ideal gas, m⁻³, at pressure P (atm) and temperature T (K): n = P / (k_B T). */
function numberDensityPerCubicMetre(pressureAtm: number, temperature: number): number {
  return (pressureAtm * PASCAL_PER_ATM) / (BOLTZMANN * temperature);
}

/**
 * [M] from the ideal gas law in the mechanism's concentration unit, or null for surface units
 * (a coverage unit has no volume, so [M] must then be given explicitly).
 */
export function idealGasConcentration(pressureAtm: number, temperature: number, unit: ConcentrationUnit): number | null {
  const perCubicMetre = numberDensityPerCubicMetre(pressureAtm, temperature);
  if (unit === 'molecule cm^-3') return perCubicMetre * 1e-6;
  if (unit === 'mol L^-1') return perCubicMetre / AVOGADRO / 1000;
  return null;
}

/**
 * How many of the given unit make one molecule cm⁻³, used to carry gas-phase bounds stated in
 * molecule cm⁻³ over to mol L⁻¹. Null for surface units (no volume).
 */
export function perMoleculePerCubicCentimetre(unit: ConcentrationUnit): number | null {
  if (unit === 'molecule cm^-3') return 1;
  if (unit === 'mol L^-1') return 1000 / AVOGADRO;
  return null;
}
