import { perMoleculePerCubicCentimetre, type ConcentrationUnit } from './units';

/** What a rate-magnitude check needs: k at the default conditions and the order it carries. */
export interface RateMagnitudeInput {
  /** Reaction order of k: reactant particles, plus one when [M] multiplies k separately. */
  order: number;
  unit: ConcentrationUnit;
  value: number;
  photolysis: boolean;
}

/**
 * Upper bounds in molecule cm⁻³ and s (common practice): a bimolecular gas-phase rate constant
 * cannot exceed the collision (capture) limit, about 1e-10 cm³ molecule⁻¹ s⁻¹ for neutrals and
 * 1e-9 for ion–molecule capture; a termolecular one stays below about 1e-28 cm⁶ molecule⁻² s⁻¹
 * (the fastest evaluated low-pressure limits are near 1e-29); a unimolecular one cannot be much
 * faster than a vibration (kT/h = 6.2e12 s⁻¹ at 298 K).
 */
const GAS_BOUNDS: Record<number, { limit: number; units: string; reason: string }> = {
  1: { limit: 1e14, units: 's⁻¹', reason: 'faster than a molecular vibration' },
  2: { limit: 1e-9, units: 'cm³ molecule⁻¹ s⁻¹', reason: 'above the gas-kinetic collision limit' },
  3: { limit: 1e-28, units: 'cm⁶ molecule⁻² s⁻¹', reason: 'above any termolecular association rate' },
};

/** Solar photolysis frequencies stay below about 1 s⁻¹ (NO3 at overhead sun ≈ 0.2 s⁻¹; common practice). */
const SOLAR_J_LIMIT = 1;

function photolysisWarnings(value: number): string[] {
  if (value <= SOLAR_J_LIMIT) return [];
  return [`J = ${value.toExponential(2)} s⁻¹ is above any solar photolysis frequency (about ${SOLAR_J_LIMIT} s⁻¹)`];
}

function boundWarnings(order: number, unit: ConcentrationUnit, value: number): string[] {
  const bound = GAS_BOUNDS[order];
  if (!bound) return [];
  const scale = order === 1 ? 1 : perMoleculePerCubicCentimetre(unit);
  if (scale === null) return [];
  // k in unit^(1-order) s⁻¹: converting from molecule cm⁻³ multiplies by (molecules per unit)^(order-1).
  const limit = bound.limit * (1 / scale) ** (order - 1);
  if (value <= limit) return [];
  const inUnit = order === 1 || unit === 'molecule cm^-3' ? bound.units : `(${unit})^${1 - order} s⁻¹`;
  return [`k = ${value.toExponential(2)} ${inUnit} for a step of order ${order} is ${bound.reason} (${limit.toExponential(1)})`];
}

/**
 * Warnings (never errors) for a rate constant that cannot be right for its order and unit system:
 * values above the physical bounds above. Non-integer orders (lumped steps) and surface units are
 * not checked. (A negative value is an error, reported where the rate is built.)
 */
export function checkRateMagnitude(input: RateMagnitudeInput): string[] {
  const { order, unit, value, photolysis } = input;
  if (photolysis) return photolysisWarnings(value);
  if (!Number.isInteger(order)) return [];
  return boundWarnings(order, unit, value);
}
