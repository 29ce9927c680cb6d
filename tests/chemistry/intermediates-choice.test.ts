import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Fraction } from '@api/chemistry/fraction';
import { rank } from '@api/chemistry/integer-matrix';
import { essentialKeys } from '@api/chemistry/intermediates';
import { analyseMechanism } from '@api/chemistry/analyse';
import { exampleText } from '../helpers/examples';

// The intermediate choice of the analysis design, step 1, rule by rule.
describe('choice of intermediates', () => {
  it('takes the species formed and consumed, less %terminal ones', () => {
    const analysis = analyseMechanism(exampleText('salt-lake-bromine.steps'));
    expect(analysis.intermediates).toEqual(['Br•', 'BrO•', 'O(3P)']);
    expect(analysis.terminalSpecies).toEqual(['O3', 'O2']);
    expect(analysis.intermediatesExplanation).toContain('less the %terminal species O3, O2');
  });

  it('releases closed-shell neutral species one at a time, in order of first appearance', () => {
    const analysis = analyseMechanism(exampleText('peroxy-lumped.steps'));
    expect(analysis.intermediates).not.toContain('O2');
    expect(analysis.intermediatesExplanation).toMatch(/O2 \(closed-shell, neutral, first met on line 8\) is released/);
  });

  it('falls back to the reactive species when no single release helps', () => {
    const analysis = analyseMechanism(exampleText('hydrogen-bromine-chain.steps'));
    expect(analysis.intermediates).toEqual(['Br•', 'H•']);
    expect(analysis.intermediatesExplanation).toContain('only the reactive species');
  });

  // Michaelis-Menten scheme with a reversible product release: Atkins' Physical Chemistry, "Enzymes" (from memory).
  it('reads reversible steps as written when nothing else cancels any species (E + S ⇌ ES → EP ⇌ E + P)', () => {
    const declarations = '%species E\n%species ES\n%species EP\n%species Sub = C6H12O6\n%species Prod = C6H12O6\n';
    const analysis = analyseMechanism(`${declarations}M1: E + Sub <=> ES\nM2: ES -> EP\nM3: EP <=> E + Prod`);
    expect(analysis.intermediates).toEqual(['E', 'ES', 'EP']);
    expect(analysis.intermediatesExplanation).toContain('read in the direction they are written');
    expect(analysis.routes).toEqual([expect.objectContaining({ multipliers: { M1: 1, M2: 1, M3: 1 }, net: 'Sub → Prod', kind: 'productive' })]);
    const roles = Object.fromEntries(analysis.species.map((item) => [item.key, item.role]));
    expect(roles).toMatchObject({ E: 'catalyst', ES: 'intermediate', EP: 'intermediate', Sub: 'reactant', Prod: 'product' });
  });

  it('keeps the reactive species, not the written direction, when they carry a route', () => {
    const analysis = analyseMechanism('R1: Br2 <=> 2 Br•\nR2: Br• + H2 <=> HBr + H•\nR3: H• + Br2 -> HBr + Br•');
    expect(analysis.intermediates).toEqual(['Br•', 'H•']);
    expect(analysis.intermediatesExplanation).toContain('only the reactive species');
  });

  it('releases one reactive species when the reactive ones leave no productive route either', () => {
    // NO• + O3 → NO2• + O2 less NO• + O(3P) ⇌ NO2• is net O3 → O2 + O(3P), NO• the catalyst (common practice).
    const analysis = analyseMechanism('Q1: NO• + O3 -> NO2• + O2\nQ2: NO• + O(3P) <=> NO2•');
    expect(analysis.intermediates).toEqual(['NO•', 'NO2•']);
    expect(analysis.intermediatesExplanation).toContain('O(3P) (first met on line 2) is released');
    expect(analysis.routes).toMatchObject([{ multipliers: { Q1: 1, Q2: -1 }, net: 'O3 → O2 + O(3P)', kind: 'productive' }]);
    expect(analysis.species.find((item) => item.key === 'NO•')?.role).toBe('catalyst');
  });

  it('makes a lone reversible step a route of its own', () => {
    const analysis = analyseMechanism('W1: N2O5 <=> NO2• + NO3•');
    expect(analysis.intermediates).toEqual([]);
    expect(analysis.routes).toMatchObject([{ multipliers: { W1: 1 }, net: 'N2O5 → NO2• + NO3•' }]);
    expect(analysis.intermediatesExplanation).toContain('every step is a route of its own');
  });

  it('says so plainly when no species is both formed and consumed', () => {
    const analysis = analyseMechanism('P1: NO• + O3 -> NO2• + O2');
    expect(analysis.intermediates).toEqual([]);
    expect(analysis.intermediatesExplanation).toBe('No species is both formed and consumed, so there are no intermediates: every step is a route of its own.');
  });

  it('follows %intermediates when given', () => {
    const analysis = analyseMechanism(`%intermediates Br•\n${exampleText('hydrogen-bromine-chain.steps')}`);
    expect(analysis.intermediates).toEqual(['Br•']);
    expect(analysis.intermediatesExplanation).toContain('as declared with %intermediates');
  });

  it('routes of Chapman chemistry alone interconvert O2 and O3 once the excited atom is the only intermediate', () => {
    // Chapman mechanism: Finlayson-Pitts & Pitts, ch. 12 (from memory).
    const analysis = analyseMechanism('C1: O2 + hν -> 2 O(3P)\nC2: O(3P) + O2 + M -> O3 + M\nC3: O3 + hν -> O2 + O(3P)\nC4: O(3P) + O3 -> 2 O2');
    expect(analysis.intermediates).toEqual(['O(3P)']);
    expect(analysis.routes).toContainEqual(expect.objectContaining({ multipliers: { C1: 1, C2: 2 }, net: '3 O2 → 2 O3' }));
  });

  it('warns when %intermediates names a species that is only formed or only consumed, placed at its spelling', () => {
    const text = '%intermediates Br., O3\nB1: Br• + O3 -> BrO• + O2\nB2: BrO• + BrO• -> 2 Br• + O2';
    const oneSided = analyseMechanism(text).diagnostics.filter((item) => item.code === 'intermediate-one-sided');
    // Br• (written Br.) is formed and consumed; O3 is only consumed.
    expect(oneSided).toEqual([expect.objectContaining({ severity: 'warning', line: 1, column: 21, found: 'O3' })]);
    expect(oneSided[0].message).toContain('which no step forms');
  });

  it('names the marked spelling when a directive drops the radical mark, and chooses for itself when no pinned name matches', () => {
    const text = '%terminal NO2, O3\n%intermediates Br, BrO\nB1: Br• + O3 -> BrO• + O2\nB2: BrO• + NO2• + M -> BrONO2 + M';
    const analysis = analyseMechanism(text);
    const unused = analysis.diagnostics.filter((item) => item.code === 'unused-directive-species');
    expect(unused.map((item) => [item.line, item.column, item.expected])).toEqual([[1, 11, ['NO2•']], [2, 16, ['Br•']], [2, 20, ['BrO•']]]);
    expect(unused[0].message).toContain('the steps write NO2•');
    // Not "every step a route of its own": the automatic choice cancels BrO•.
    expect(analysis.intermediates).toEqual(['BrO•']);
  });
});

describe('releasing a species, decided by rank for larger mechanisms', () => {
  // Random ±1/±2 stoichiometric matrices; the brute force removes each row and recomputes the rank.
  const matrix = fc.array(fc.array(fc.integer({ min: -2, max: 2 }), { minLength: 7, maxLength: 7 }), { minLength: 1, maxLength: 8 });

  it('finds exactly the rows whose removal lowers the rank, in one elimination', () => {
    fc.assert(
      fc.property(matrix, (values) => {
        const keys = values.map((_, index) => `X${index}`);
        const rows = new Map(values.map((row, index) => [keys[index], new Map(row.flatMap((value, step) => (value === 0 ? [] : [[step, Fraction.of(value)] as const])))]));
        const stoichiometry = { stepCount: 7, reversible: Array<boolean>(7).fill(false), rows, columns: [], aside: new Set<string>() };
        const sparse = (list: string[]) => list.map((key) => new Map([...(rows.get(key) ?? [])].map(([step, value]) => [step, value.num])));
        const whole = rank(sparse(keys), 7);
        const bruteForce = keys.filter((key) => (rows.get(key)?.size ?? 0) > 0 && rank(sparse(keys.filter((other) => other !== key)), 7) < whole);
        expect([...essentialKeys(stoichiometry, keys)]).toEqual(bruteForce);
      }),
      { numRuns: 300, seed: 20261203 },
    );
  });
});
