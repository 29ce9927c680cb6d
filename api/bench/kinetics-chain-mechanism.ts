import type { KineticModel, KineticStep } from '@api/chemistry/kinetics/model';
import { logUniform, seededRandom, terms } from './kinetics-mechanism';

const HUBS = 10;
const CHAIN_LENGTH = 10;

interface Builder {
  random: () => number;
  steps: KineticStep[];
  hub: () => number;
  member: (family: number, position: number) => number;
}

function add(builder: Builder, reactants: number[], products: number[], rate: number, kind: 'thermal' | 'photolysis' | 'third-body' = 'thermal'): void {
  builder.steps.push({
    label: `H${builder.steps.length + 1}`, reactants: terms(reactants), products: terms(products),
    thirdBody: kind === 'third-body', photolysis: kind === 'photolysis', forward: rate.toExponential(3), reverse: null,
  });
}

/**
 * Each chain member is oxidised by a hub radical (passing the radical on), photolysed, and (every
 * other one) isomerises into the next member; only the chain's end releases a new radical, so a
 * termination that starts a chain (−2 radicals) can never be outgrown by it (bounded radicals).
 */
function chainSteps(builder: Builder, families: number): void {
  const { random, hub, member } = builder;
  for (let f = 0; f < families; f++) {
    for (let j = 0; j < CHAIN_LENGTH; j++) {
      const last = j + 1 === CHAIN_LENGTH;
      const next = last ? [hub()] : [member(f, j + 1)];
      add(builder, [member(f, j), hub()], last ? [hub()] : [...next, hub()], logUniform(random, 1e-14, 1e-10));
      add(builder, [member(f, j)], next, logUniform(random, 1e-6, 1e-3), 'photolysis');
      if (j % 2 === 1) add(builder, [member(f, j)], next, logUniform(random, 1e-4, 1e2));
    }
  }
}

/** Radical cycling, photolysis, association with M, and termination back into chain starts. */
function hubSteps(builder: Builder, count: number, families: number): void {
  const { random, hub, member } = builder;
  for (let k = 0; k < count; k++) {
    const kind = k % 4;
    if (kind === 0) add(builder, [hub(), hub()], [hub(), hub()], logUniform(random, 1e-15, 1e-11));
    else if (kind === 1) add(builder, [hub()], [hub(), hub()], logUniform(random, 1e-5, 1e-2), 'photolysis');
    else if (kind === 2) add(builder, [hub(), hub()], [hub()], logUniform(random, 1e-32, 1e-30), 'third-body');
    else add(builder, [hub(), hub()], [member(Math.floor(random() * families), 0)], logUniform(random, 1e-12, 1e-10));
  }
}

/**
 * A hub-and-chain stiff mechanism shaped like an atmospheric one: `species − 10` species in
 * degradation chains of ten, each member oxidised by one of ten radical hubs (as VOCs by OH, NO3,
 * O3), photolysed and thermally converted into the next member, plus radical cycling, photolysis,
 * third-body association and termination among the hubs. Time scales run from 10 ms to months.
 */
export function hubAndChainMechanism(species = 200, steps = 600, seed = 20_251_203): KineticModel {
  const random = seededRandom(seed);
  const families = Math.floor((species - HUBS) / CHAIN_LENGTH);
  const builder: Builder = {
    random, steps: [],
    hub: () => Math.floor(random() * HUBS),
    member: (family, position) => HUBS + family * CHAIN_LENGTH + position,
  };
  chainSteps(builder, families);
  hubSteps(builder, steps - builder.steps.length, families);
  const names = [...Array.from({ length: HUBS }, (_, i) => `R${i}`), ...Array.from({ length: families * CHAIN_LENGTH }, (_, i) => `C${i}`)];
  return { species: names, steps: builder.steps.slice(0, steps), unit: 'molecule cm^-3' };
}

/** Hubs at 1e6–1e12 molecule cm⁻³ (radicals to ozone-like), each chain's first member at 1e10–1e11. */
export function hubAndChainInitial(model: KineticModel): Record<string, number> {
  const random = seededRandom(11);
  const hubs = model.species.slice(0, HUBS).map((key) => [key, logUniform(random, 1e6, 1e12)]);
  const starts = model.species.slice(HUBS).filter((_, i) => i % CHAIN_LENGTH === 0).map((key) => [key, logUniform(random, 1e10, 1e11)]);
  return Object.fromEntries([...hubs, ...starts]);
}
