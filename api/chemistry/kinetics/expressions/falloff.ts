/**
 * The termolecular fall-off form of step-notation.md: with x = k0·[M]/k∞,
 * k = k0·[M] / (1 + x) · Fc^(1 / (1 + (log10 x)²)).
 * The result already contains [M] (it is an effective bimolecular rate constant).
 * This is the broadening form of the NASA/JPL evaluation (Burkholder et al., JPL Publication 19-5,
 * section 2, termolecular reactions), with Fc given per reaction instead of JPL's fixed 0.6.
 */
export function falloffRate(k0: number, kInfinity: number, broadening: number, thirdBody: number): number {
  // Out of range the form still gives a number (0 for k∞ = 0 or Fc = 0), silently wrong: refuse it.
  if (!(kInfinity > 0)) throw new RangeError(`falloff: k∞ must be positive, not ${kInfinity}`);
  if (!(k0 >= 0)) throw new RangeError(`falloff: k0 must be zero or positive, not ${k0}`);
  if (!(broadening > 0 && broadening <= 1)) throw new RangeError(`falloff: the broadening factor Fc must be above 0 and at most 1, not ${broadening}`);
  const lowPressure = k0 * thirdBody;
  const ratio = lowPressure / kInfinity;
  const exponent = 1 / (1 + Math.log10(ratio) ** 2);
  return (lowPressure / (1 + ratio)) * broadening ** exponent;
}
