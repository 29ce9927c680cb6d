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

// Direct routes are the elementary routes (Horiuti–Temkin; in metabolic networks, elementary flux modes):
// a route is direct exactly when the stoichiometry of the intermediates over its own steps has a null space
// of dimension one (so no route uses fewer of those steps), and it runs every one-way step forwards
// (Schuster & Hilgetag, J. Biol. Syst. 2 (1994) 165; from memory). Found here by trying every set of steps.
/** Gaussian elimination to reduced row echelon form, exactly; returns the pivot columns. */
function eliminate(rows: Fraction[][], width: number): number[] {
  const pivots: number[] = [];
  let rank = 0;
  for (let column = 0; column < width && rank < rows.length; column += 1) {
    const found = rows.findIndex((row, index) => index >= rank && !row[column].isZero());
    if (found < 0) continue;
    [rows[rank], rows[found]] = [rows[found], rows[rank]];
    const pivot = rows[rank][column];
    rows[rank] = rows[rank].map((value) => value.div(pivot));
    rows.forEach((row, index) => {
      if (index === rank || row[column].isZero()) return;
      const factor = row[column];
      rows[index] = row.map((value, at) => value.sub(rows[rank][at].mul(factor)));
    });
    pivots.push(column);
    rank += 1;
  }
  return pivots;
}

function nullVector(columns: Fraction[][]): Fraction[] | null {
  // Rows (intermediates) × columns (steps); a vector only when the nullity is one.
  const width = columns.length;
  const rows = columns[0].map((_, row) => columns.map((column) => column[row]));
  const pivots = eliminate(rows, width);
  const rank = pivots.length;
  if (width - rank !== 1) return null;
  const free = [...Array(width).keys()].find((column) => !pivots.includes(column)) as number;
  const vector = Array.from({ length: width }, () => Fraction.ZERO);
  vector[free] = Fraction.ONE;
  pivots.forEach((column, row) => (vector[column] = rows[row][free].neg()));
  return vector;
}

function integerRoute(vector: Fraction[]): bigint[] {
  let scale = 1n;
  for (const value of vector) scale = (scale * value.den) / gcd(scale, value.den);
  const whole = vector.map((value) => (value.num * scale) / value.den);
  const divisor = whole.reduce((g, value) => gcd(g, value < 0n ? -value : value), 0n);
  return whole.map((value) => value / divisor);
}

function expectedDirectRoutes(analysis: MechanismAnalysis): Set<string> {
  const steps = analysis.steps;
  const found = new Set<string>();
  for (let subset = 1; subset < 1 << steps.length; subset += 1) {
    const chosen = steps.filter((_, index) => subset & (1 << index));
    const columns = chosen.map((step) => (analysis.intermediates.length ? analysis.intermediates : ['(none)']).map((key) => nu(analysis, step.id, key)));
    const vector = nullVector(columns);
    if (!vector || vector.some((value) => value.isZero())) continue;
    let route = integerRoute(vector);
    const oneWay = chosen.map((step, index) => (step.reversible ? 0 : route[index] > 0n ? 1 : -1));
    if (oneWay.includes(1) && oneWay.includes(-1)) continue;
    if (oneWay.includes(-1)) route = route.map((value) => -value);
    found.add(routeKey(chosen.map((step) => step.id), route));
  }
  return found;
}

/** A route as text, its sign fixed by its first step when every step it uses is reversible. */
function routeKey(ids: string[], route: bigint[]): string {
  return ids.map((id, index) => `${route[index]}×${id}`).join(' ');
}

function reportedDirectRoutes(analysis: MechanismAnalysis): Set<string> {
  return new Set(
    analysis.routes
      .filter((route) => route.direct)
      .map((route) => {
        const ids = analysis.steps.map((step) => step.id).filter((id) => route.multipliers[id] !== undefined);
        return routeKey(ids, ids.map((id) => BigInt(route.multipliers[id])));
      }),
  );
}

/** Both signs of a route that uses reversible steps only, as the other key it may be reported under. */
function withBothSigns(keys: Set<string>, analysis: MechanismAnalysis): Set<string> {
  const all = new Set<string>();
  for (const key of keys) {
    all.add(key);
    const terms = key.split(' ').map((term) => term.split('×'));
    const allReversible = terms.every(([, id]) => analysis.steps.find((step) => step.id === id)?.reversible);
    if (allReversible) all.add(terms.map(([value, id]) => `${-BigInt(value)}×${id}`).join(' '));
  }
  return all;
}

describe('the route basis (property-based)', () => {
  it('spans every route: the reported routes have rank = steps − rank of the intermediates over the steps', () => {
    fc.assert(
      fc.property(mechanism, (steps) => {
        const analysis = analyseMechanism(text(steps));
        if (analysis.steps.length === 0) return;
        const ids = analysis.steps.map((item) => item.id);
        const stoichiometry = analysis.intermediates.map((key) => ids.map((id) => nu(analysis, id, key)));
        const nullity = ids.length - eliminate(stoichiometry, ids.length).length;
        const routes = analysis.routes.map((route) => ids.map((id) => Fraction.of(route.multipliers[id] ?? 0)));
        expect(eliminate(routes, ids.length).length).toBe(nullity);
      }),
      { numRuns: 300 },
    );
  });
});

describe('direct routes (property-based)', () => {
  it('are exactly the elementary routes found by trying every set of steps', () => {
    const small = fc.array(step, { minLength: 1, maxLength: 7 });
    fc.assert(
      fc.property(small, (steps) => {
        const analysis = analyseMechanism(text(steps));
        if (analysis.steps.length === 0) return;
        const expected = expectedDirectRoutes(analysis);
        const reported = reportedDirectRoutes(analysis);
        expect(reported.size).toBe(expected.size);
        const either = withBothSigns(expected, analysis);
        for (const key of reported) expect(either).toContain(key);
      }),
      { numRuns: 300 },
    );
  });
});
