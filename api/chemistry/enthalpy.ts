import type { Fraction } from './fraction';
import type { RegisteredSpecies } from './species-registry';
import type { StepModel } from './step-model';
import { resolveSpecies, type DeclaredSpecies } from './species-resolve';
import { roundNoise } from './thermo-lookup';
import { addToNet, clearNet, netEnthalpy, newNetReaction, reactionEnthalpy, type NetReaction, thresholdWavelengthNm, type EnthalpyEntry, type EnthalpyLookup } from './thermo';

/** A lookup that asks the underlying table once per key. */
export function cachedLookup(lookup: EnthalpyLookup): EnthalpyLookup {
  const cache = new Map<string, EnthalpyEntry | null>();
  return (key) => {
    let entry = cache.get(key);
    if (entry === undefined) {
      entry = lookup(key);
      cache.set(key, entry);
    }
    return entry;
  };
}

/**
 * A lookup in which a name declared with a composition (`%species RO2 = C2H5O2•`) takes the
 * enthalpy of the species it is declared as: the name stands for exactly that spelling. Opaque
 * names and everything else are looked up as written.
 */
export function declaredNamesLookup(lookup: EnthalpyLookup, declarations: ReadonlyMap<string, DeclaredSpecies>): EnthalpyLookup {
  const spelled = new Map<string, string>();
  for (const [name, declared] of declarations) {
    const key = declared.species ? resolveSpecies(declared.species, NO_DECLARATIONS).info?.key : undefined;
    if (key) spelled.set(name, key);
  }
  return spelled.size === 0 ? lookup : (key) => lookup(spelled.get(key) ?? key);
}

const NO_DECLARATIONS: ReadonlyMap<string, DeclaredSpecies> = new Map();

export interface StepEnthalpy {
  dH: number | null;
  missing: string[];
  used: EnthalpyEntry[];
  thresholdNm: number | null;
}

/** The species' entry, looked up once per analysis and kept on the listed species (no table lookup per term). */
export function enthalpyOf(species: RegisteredSpecies, lookup: EnthalpyLookup): EnthalpyEntry | null {
  if (species.enthalpy === undefined) species.enthalpy = lookup(species.key);
  return species.enthalpy;
}

/** ΔH of a step by Hess's law, and for a photolysis step with ΔH > 0 its threshold wavelength (per photon). */
export function stepEnthalpy(step: StepModel, lookup: EnthalpyLookup): StepEnthalpy {
  const net = stepNet;
  clearNet(net);
  let photons = 0;
  for (const term of step.reactants) {
    addToNet(net, term.key, -term.coef, enthalpyOf(term.species, lookup));
    if (term.species.kind === 'photon') photons += term.coef;
  }
  for (const term of step.products) addToNet(net, term.key, term.coef, enthalpyOf(term.species, lookup));
  const { dH, missing, used } = netEnthalpy(net, lookup);
  // Each of n photons (2 hν) brings ΔH / n: the threshold is the longest wavelength one photon may have.
  return { dH, missing, used, thresholdNm: photons > 0 && dH !== null ? thresholdWavelengthNm(dH / photons) : null };
}

// One scratch net reaction for every step (a step is computed synchronously, and a table per step
// was garbage the collector had to sweep on large mechanisms).
const stepNet: NetReaction = newNetReaction();

export interface RouteEnthalpy {
  /** Σ σ ΔH(step) when every step's ΔH is known, else ΔH of the net reaction. */
  dH: number | null;
  fromSteps: number | null;
  fromNet: number | null;
}

/** ΔH of a route two ways: from its steps and from its net reaction (they must agree: Hess's law). */
export function routeEnthalpy(sigma: readonly bigint[], stepDH: readonly (number | null)[], net: ReadonlyMap<string, Fraction>, lookup: EnthalpyLookup): RouteEnthalpy {
  let fromSteps: number | null = 0;
  sigma.forEach((value, step) => {
    if (value === 0n || fromSteps === null) return;
    const dH = stepDH[step];
    fromSteps = dH === null ? null : fromSteps + Number(value) * dH;
  });
  const terms = [...net].map(([key, coef]) => ({ key, coef: coef.toNumber() }));
  const fromNet = reactionEnthalpy(terms, lookup).dH;
  const summed = fromSteps === null ? null : roundNoise(fromSteps);
  return { dH: summed ?? fromNet, fromSteps: summed, fromNet };
}
