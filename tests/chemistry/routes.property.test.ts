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
