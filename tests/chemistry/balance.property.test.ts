import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';

// Property: a step built to conserve every element is reported balanced; moving one atom makes it
// unbalanced in exactly that element, by exactly one (conservation of mass, common practice).
const SYMBOLS = ['C', 'H', 'O', 'N', 'Cl', 'Br', 'S'];
type Composition = Record<string, number>;

const composition = fc.dictionary(fc.constantFrom(...SYMBOLS), fc.integer({ min: 1, max: 6 }), { minKeys: 1, maxKeys: 4 });
const reactants = fc.array(fc.record({ coef: fc.integer({ min: 1, max: 3 }), species: composition }), { minLength: 1, maxLength: 3 });

function formula(species: Composition): string {
  return SYMBOLS.filter((symbol) => species[symbol]).map((symbol) => (species[symbol] === 1 ? symbol : `${symbol}${species[symbol]}`)).join('');
}

/** Deals the atoms of `total` out over `parts` product species; drops empty ones. */
function split(total: Composition, parts: number, seed: number): Composition[] {
  const products: Composition[] = Array.from({ length: parts }, () => ({}));
  let turn = seed;
  for (const symbol of SYMBOLS) {
    for (let atom = 0; atom < (total[symbol] ?? 0); atom += 1) {
      const target = products[turn++ % parts];
      target[symbol] = (target[symbol] ?? 0) + 1;
    }
    turn += seed;
  }
  return products.filter((product) => Object.keys(product).length > 0);
}

function totalOf(terms: { coef: number; species: Composition }[]): Composition {
  const total: Composition = {};
  for (const { coef, species } of terms) for (const [symbol, count] of Object.entries(species)) total[symbol] = (total[symbol] ?? 0) + coef * count;
  return total;
}

function stepText(left: { coef: number; species: Composition }[], right: Composition[]): string {
  const side = left.map(({ coef, species }) => `${coef === 1 ? '' : `${coef} `}${formula(species)}`).join(' + ');
  return `${side} -> ${right.map(formula).join(' + ')}`;
}

describe('balance (property-based)', () => {
  it('reports a step that conserves every element as balanced', () => {
    fc.assert(
      fc.property(reactants, fc.integer({ min: 1, max: 3 }), fc.nat(7), (left, parts, seed) => {
        const [step] = analyseMechanism(stepText(left, split(totalOf(left), parts, seed))).steps;
        expect(step).toMatchObject({ balanced: true, imbalance: {}, chargeDelta: 0, siteDelta: 0 });
      }),
      { numRuns: 200 },
    );
  });

  it('reports one extra atom in a product as an imbalance of +1 in that element only', () => {
    fc.assert(
      fc.property(reactants, fc.integer({ min: 1, max: 3 }), fc.nat(7), fc.constantFrom(...SYMBOLS), (left, parts, seed, extra) => {
        const products = split(totalOf(left), parts, seed);
        products[0] = { ...products[0], [extra]: (products[0][extra] ?? 0) + 1 };
        const analysis = analyseMechanism(stepText(left, products));
        expect(analysis.steps[0]).toMatchObject({ balanced: false, imbalance: { [extra]: 1 } });
        expect(Object.keys(analysis.steps[0].imbalance)).toEqual([extra]);
        expect(analysis.diagnostics).toContainEqual(expect.objectContaining({ code: 'element-imbalance', found: `${extra} +1` }));
      }),
      { numRuns: 200 },
    );
  });
});
