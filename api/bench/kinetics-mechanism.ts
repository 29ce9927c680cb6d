import type { KineticModel, KineticStep } from '@api/chemistry/kinetics/model';

/** A small deterministic generator (mulberry32), so every bench run integrates the same mechanism. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Generator {
  random: () => number;
  byMass: number[][];
}

export const logUniform = (random: () => number, low: number, high: number) => low * (high / low) ** random();
export const pick = <T>(random: () => number, items: T[]): T => items[Math.floor(random() * items.length)];

/** Products whose "mass" sums to `mass`: one species, or two when the mass can be split. */
function productsOf(generator: Generator, mass: number): number[] {
  const { random, byMass } = generator;
  if (mass > 4 || (mass >= 2 && random() < 0.6)) {
    const first = 1 + Math.floor(random() * Math.min(mass - 1, 3));
    return [pick(random, byMass[first]), ...productsOf(generator, mass - first)];
  }
  return [pick(random, byMass[mass])];
}

export function terms(indices: number[]) {
  return indices.map((index) => ({ index, coef: 1 }));
}

type Kind = 'photolysis' | 'bimolecular' | 'unimolecular' | 'termolecular';

function stepOf(generator: Generator, kind: Kind, label: string): KineticStep {
  const { random, byMass } = generator;
  const heavy = () => pick(random, [...byMass[2], ...byMass[3], ...byMass[4]]);
  const light = () => pick(random, [...byMass[1], ...byMass[2]]);
  const massOf = (index: number) => byMass.findIndex((group) => group.includes(index));
  const reactants = kind === 'photolysis' || kind === 'unimolecular' ? [heavy()] : [light(), light()];
  const mass = reactants.reduce((sum, index) => sum + massOf(index), 0);
  const rate = {
    photolysis: () => logUniform(random, 1e-6, 1e-2),
    bimolecular: () => logUniform(random, 1e-17, 1e-10),
    unimolecular: () => logUniform(random, 1e-4, 1e2),
    termolecular: () => logUniform(random, 1e-33, 1e-30),
  }[kind]();
  return {
    label, reactants: terms(reactants), products: terms(productsOf(generator, mass)),
    thirdBody: kind === 'termolecular', photolysis: kind === 'photolysis', forward: rate.toExponential(3), reverse: null,
  };
}

/**
 * A random-graph stiff mechanism: `species` species in four "mass" classes and `steps` steps
 * (photolysis, bimolecular, unimolecular and termolecular association) that conserve the mass, so
 * every concentration stays bounded. Rate constants span 1e-17–1e-10 cm³ s⁻¹ and 1e-4–1e2 s⁻¹, so
 * time scales range from milliseconds to years. Any species may meet any other, which is the worst
 * case for the sparsity of the LU factors (real mechanisms couple through a few radical hubs).
 */
export function randomGraphMechanism(species = 200, steps = 600, seed = 20_251_202): KineticModel {
  const random = seededRandom(seed);
  const byMass: number[][] = [[], [], [], [], []];
  for (let i = 0; i < species; i++) byMass[1 + (i % 4)].push(i);
  const generator = { random, byMass };
  const kinds: Kind[] = ['photolysis', 'bimolecular', 'bimolecular', 'bimolecular', 'unimolecular', 'termolecular'];
  const list = Array.from({ length: steps }, (_, s) => stepOf(generator, kinds[s % kinds.length], `G${s + 1}`));
  return { species: Array.from({ length: species }, (_, i) => `X${i}`), steps: list, unit: 'molecule cm^-3' };
}

/** Initial concentrations of the random-graph mechanism: every fifth species at 1e9–1e12 molecule cm⁻³. */
export function randomGraphInitial(model: KineticModel): Record<string, number> {
  const random = seededRandom(7);
  return Object.fromEntries(model.species.filter((_, i) => i % 5 === 0).map((key) => [key, logUniform(random, 1e9, 1e12)]));
}
