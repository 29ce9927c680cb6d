import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMechanism, type MechanismAnalysis } from '@api/chemistry/analyse';
import { Fraction, gcd } from '@api/chemistry/fraction';

// Property (Horiuti–Temkin): every reported route σ satisfies Σ_s σ_s ν_{s,i} = 0 exactly for every
// intermediate i; σ is a coprime integer vector; a direct route never runs a one-way step backwards.
const NAMES = ['Aa', 'Bb', 'Cc', 'Dd', 'Ee', 'Ff'];
const side = fc.array(fc.record({ coef: fc.constantFrom('1', '2', '1/2', '3'), name: fc.constantFrom(...NAMES) }), { minLength: 1, maxLength: 2 });
const step = fc.record({ left: side, right: side, reversible: fc.boolean() });
const mechanism = fc.array(step, { minLength: 1, maxLength: 9 });

function text(steps: { left: { coef: string; name: string }[]; right: { coef: string; name: string }[]; reversible: boolean }[]): string {
  const terms = (list: { coef: string; name: string }[]) => list.map((term) => `${term.coef} ${term.name}`).join(' + ');
  const declarations = NAMES.map((name) => `%species ${name}`);
  return [...declarations, ...steps.map((s, index) => `S${index + 1}: ${terms(s.left)} ${s.reversible ? '<=>' : '->'} ${terms(s.right)}`)].join('\n');
}

function nu(analysis: MechanismAnalysis, stepId: string, key: string): Fraction {
  const step = analysis.steps.find((s) => s.id === stepId);
  let total = Fraction.ZERO;
  for (const term of step?.products ?? []) if (term.key === key) total = total.add(Fraction.parse(term.coefText) as Fraction);
  for (const term of step?.reactants ?? []) if (term.key === key) total = total.sub(Fraction.parse(term.coefText) as Fraction);
  return total;
}

describe('routes (property-based)', () => {
  it('cancel every intermediate exactly, in coprime integers, with direct routes running one-way steps forwards', () => {
    fc.assert(
      fc.property(mechanism, (steps) => {
        const analysis = analyseMechanism(text(steps));
        for (const route of analysis.routes) {
          const multipliers = Object.entries(route.multipliers);
          expect(multipliers.every(([, value]) => Number.isInteger(value) && value !== 0)).toBe(true);
          expect(multipliers.reduce((g, [, value]) => gcd(g, BigInt(value)), 0n)).toBe(1n);
          for (const key of analysis.intermediates) {
            let total = Fraction.ZERO;
            for (const [id, value] of multipliers) total = total.add(nu(analysis, id, key).mul(Fraction.of(value)));
            expect(total.toString()).toBe('0');
          }
          if (route.direct) {
            for (const [id, value] of multipliers) if (!analysis.steps.find((s) => s.id === id)?.reversible) expect(value).toBeGreaterThan(0);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('give a net reaction equal to Σ σ ν over the other species', () => {
    fc.assert(
      fc.property(mechanism, (steps) => {
        const analysis = analyseMechanism(text(steps));
        for (const route of analysis.routes) {
          for (const species of analysis.species.filter((s) => !analysis.intermediates.includes(s.key))) {
            let total = Fraction.ZERO;
            for (const [id, value] of Object.entries(route.multipliers)) total = total.add(nu(analysis, id, species.key).mul(Fraction.of(value)));
            expect(total.toNumber()).toBeCloseTo(route.netSpecies[species.key] ?? 0, 12);
          }
        }
      }),
      { numRuns: 200 },
    );
  });

  it('make the overall route use every step that some direct route uses', () => {
    fc.assert(
      fc.property(mechanism, (steps) => {
        const analysis = analyseMechanism(text(steps));
        if (analysis.overall === null) return;
        const used = new Set(analysis.routes.filter((route) => route.direct).flatMap((route) => Object.keys(route.multipliers)));
        expect(new Set(Object.keys(analysis.routes[analysis.overall].multipliers))).toEqual(used);
      }),
      { numRuns: 200 },
    );
  });
});

// Hess's law: the ΔH of a route summed over its steps equals the ΔH of its net reaction, for any set of
// balanced steps over species with tabulated enthalpies of formation (common practice).
const BALANCED_STEPS = [
  'O3 + hν -> O2 + O(3P)',
  'O(3P) + O2 + M -> O3 + M',
  'O(3P) + O3 -> 2 O2',
  'NO• + O3 -> NO2• + O2',
  'NO2• + O(3P) -> NO• + O2',
  'NO2• + hν -> NO• + O(3P)',
  'Cl• + O3 -> ClO• + O2',
  'ClO• + O(3P) -> Cl• + O2',
  'ClO• + NO• -> Cl• + NO2•',
  'OH• + O3 -> HO2• + O2',
  'HO2• + O3 -> OH• + 2 O2',
  'HO2• + NO• -> OH• + NO2•',
  'OH• + H2 -> H2O + H•',
  'H• + O2 + M -> HO2• + M',
  'Cl• + H2 -> HCl + H•',
  'H• + Cl2 -> HCl + Cl•',
  'Cl2 + hν -> 2 Cl•',
  'H2O2 + hν -> 2 OH•',
  'HO2• + HO2• -> H2O2 + O2',
];

describe('route enthalpies (property-based)', () => {
  it('agree between Σ σ ΔH(step) and ΔH of the net reaction whenever both are known', () => {
    const picks = fc.uniqueArray(fc.record({ index: fc.nat(BALANCED_STEPS.length - 1), reversible: fc.boolean() }), { minLength: 1, maxLength: 9, selector: (pick) => pick.index });
    let compared = 0;
    fc.assert(
      fc.property(picks, (chosen) => {
        // A reversible step may not absorb light (its reverse would give it off), so those stay one-way.
        const lines = chosen.map(({ index, reversible }, position) => {
          const equation = BALANCED_STEPS[index];
          return `S${position + 1}: ${reversible && !equation.includes('hν') ? equation.replace('->', '<=>') : equation}`;
        });
        const analysis = analyseMechanism(lines.join('\n'));
        expect(analysis.diagnostics.filter((item) => item.severity === 'error')).toEqual([]);
        for (const route of analysis.routes) {
          if (route.dHFromSteps === null || route.dHFromNet === null) continue;
          expect(route.dHFromSteps).toBeCloseTo(route.dHFromNet, 6);
          compared += 1;
        }
      }),
      { numRuns: 200 },
    );
    expect(compared).toBeGreaterThan(100);
  });
});
