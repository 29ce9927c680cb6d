import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { formatReport } from '@api/chemistry/report-text';

/** The suggested-fix findings of a text. */
function suggestedFixes(text: string) {
  return analyseMechanism(text).diagnostics.filter((item) => item.code === 'suggested-fix');
}

/** The balanced equations the suggested fixes propose. */
function fixes(text: string) {
  return suggestedFixes(text).map((item) => item.expected?.[0]);
}

function species(text: string, key: string) {
  return analyseMechanism(text).species.find((item) => item.key === key);
}

describe('species model', () => {
  // Electron counts Σ Z − charge: N 7, O 8, Cl 17, Br 35, Fe 26 (IUPAC periodic table).
  it.each([
    ['NO', 15, true],
    ['NO2', 23, true],
    ['ClO', 25, true],
    ['O3', 24, false],
    ['Fe^3+', 23, true],
    ['Cl^-', 18, false],
    ['OH•', 9, true],
  ])('%s has %i electrons (radical: %s)', (key, electrons, radical) => {
    expect(species(`${key} + hν -> ${key}`, key)).toMatchObject({ electrons, radical });
  });

  it('writes keys in canonical form: formula, state, • marks, charge, *', () => {
    const analysis = analyseMechanism('Br. + O(1D) + Fe^3+ + CO* + O2*2 -> Xe');
    expect(analysis.species.map((item) => item.key)).toEqual(['Br•', 'O(1D)', 'Fe^3+', 'CO*', 'O2*2', 'Xe']);
  });

  it('treats a state-tagged even-electron species as reactive but not a radical; a marked one as a radical', () => {
    expect(species('O(1D) + H2O -> 2 OH•', 'O(1D)')).toMatchObject({ radical: false, reactive: true });
    expect(species('O(3P)• + O2 + M -> O3 + M', 'O(3P)•')).toMatchObject({ radical: true });
  });

  it('flags an even number of marks on an odd-electron species, and names a molecular state by its term symbol', () => {
    const diagnostics = analyseMechanism('H2 + OH•• -> H2O + H•\nCH2•• + O2 -> HCO• + OH•').diagnostics;
    // OH has 9 electrons (8 + 1), CH2 has 8 (6 + 2): periodic table.
    const parity = diagnostics.find((item) => item.code === 'radical-marks-parity');
    expect(parity).toMatchObject({ severity: 'warning', line: 1, column: 6, expected: ['OH•'] });
    const even = diagnostics.find((item) => item.code === 'even-electrons-marked');
    expect(even?.message).toContain('CH2(3B1)••');
    expect(even?.message).not.toContain('CH2(3P)');
  });

  it('does not make a phase tag reactive', () => {
    expect(species('Br2(g) + hν -> 2 Br•', 'Br2(g)')).toMatchObject({ reactive: false, radical: false });
  });

  it('balances a declared name like its formula, and says so', () => {
    const analysis = analyseMechanism('%species RO2 = C2H5O2•\n%species RO = C2H5O•\nP1: RO2 + NO• -> RO + NO2•');
    expect(analysis.steps[0].balanced).toBe(true);
    expect(analysis.species[0]).toMatchObject({ key: 'RO2', name: 'RO2', formula: 'C2H5O2', radical: true, declared: true });
  });

  it('reads a declared radical written with or without its mark as one species', () => {
    const text = '%species RO2 = C2H5O2•\n%species R = C2H5\nP1: RO2• + NO• -> RO2 + NO•\nP2: R• + O2 -> RO2';
    const analysis = analyseMechanism(text);
    expect(analysis.species.map((item) => item.key)).toEqual(['RO2', 'NO•', 'R', 'O2']);
    expect(analysis.steps[0].equation).toBe('RO2 + NO• → RO2 + NO•');
    // Two marks are more than the declaration says: another species (a diradical form).
    expect(analyseMechanism(`${text}\nP3: RO2•• -> RO2`).species.map((item) => item.key)).toContain('RO2••');
  });

  it('refuses a declared ion written with another charge, at the charge', () => {
    const analysis = analyseMechanism('%species Sup = O2^-\nS1: Sup^2- -> Sup + e^-\nS2: Sup^- + H^+ -> HO2•');
    const [error] = analysis.diagnostics.filter((item) => item.severity === 'error');
    expect(error).toMatchObject({ code: 'bad-declaration', line: 2, column: 8, found: '^2-' });
    expect(error.message).toContain('declared on line 1 as O2^- (charge −1)');
    expect(analysis.species.map((item) => item.key)).toEqual(['Sup^-', 'H^+', 'HO2•']);
  });

  it('lists only the species of steps that could be read', () => {
    expect(analyseMechanism('O3 + Xy -> O2').species).toEqual([]);
  });

  it('treats isomers written differently as different species', () => {
    expect(analyseMechanism('CH3CHO -> C2H4O').species.map((item) => item.key)).toEqual(['CH3CHO', 'C2H4O']);
  });
});

describe('step checks', () => {
  // Radical classes: Atkins' Physical Chemistry, "Chain reactions" (from memory).
  it.each([
    ['Br2 + hν -> 2 Br•', 'initiation'],
    ['Br• + H2 -> HBr + H•', 'propagation'],
    ['H• + O2 -> OH• + O(3P)•', 'branching'],
    ['Br• + Br• + M -> Br2 + M', 'termination'],
    ['H2 + I2 -> 2 HI', 'non-radical'],
  ])('%s is %s', (text, stepClass) => {
    expect(analyseMechanism(text).steps[0].class).toBe(stepClass);
  });

  it('counts molecularity with M and without the photon, and flags lumped steps as not elementary', () => {
    const [a, b, c] = analyseMechanism('O(3P) + O2 + M -> O3 + M\nO3 + hν -> O2 + O(3P)\nO3 -> 1.5 O2').steps;
    expect([a.molecularity, a.elementary]).toEqual([3, true]);
    expect([b.molecularity, b.photolysis]).toEqual([1, true]);
    expect([c.elementary, c.balanced]).toEqual([false, true]);
  });

  it('writes A + A as 2 A and keeps exact fractions', () => {
    const [step] = analyseMechanism('BrO• + BrO• -> 2 Br• + O2\n').steps;
    expect(step.equation).toBe('2 BrO• → 2 Br• + O2');
    expect(step.normalised).toBe('2 BrO• -> 2 Br• + 1 O2');
    const [lumped] = analyseMechanism('1/3 O3 -> 1/2 O2').steps;
    expect(lumped.reactants[0]).toEqual({ key: 'O3', coef: 1 / 3, coefText: '1/3' });
  });

  it('suggests the smallest whole-number change that balances a step', () => {
    expect(fixes('2 O3 -> 2 O2')).toEqual(['2 O3 → 3 O2']);
    expect(fixes('H2O2 + I^- -> IO^-')).toEqual(['H2O2 + I^- → IO^- + H2O']);
    expect(fixes('CO + * -> CO*2')).toEqual(['CO + 2 * → CO*2']);
    expect(fixes('Fe^3+ -> Fe^2+')).toEqual(['Fe^3+ + e^- → Fe^2+']);
    expect(fixes('C6H12O6 -> Xe')).toEqual([]);
  });

  it('offers a fraction only for a step already written with fractions', () => {
    expect(fixes('Cl• + O3 -> ClO• + O3')).toEqual([]);
    // Oxygen: 2 + 3 × 2/3 = 1 + 2 × 1/2 + 2.
    expect(fixes('CH3O2• + 1/2 O3 -> HCHO + 0.5 O2 + HO2•')).toEqual(['CH3O2• + 2/3 O3 → HCHO + 1/2 O2 + HO2•']);
  });

  it('gives no ΔH or threshold for a step that does not conserve its atoms', () => {
    const [unbalanced] = analyseMechanism('Cl2 + hν -> Cl•').steps;
    expect(unbalanced).toMatchObject({ balanced: false, dH: null, thresholdNm: null });
    const [balanced] = analyseMechanism('Cl2 + hν -> 2 Cl•').steps;
    expect(balanced.dH).not.toBeNull();
    const analysis = analyseMechanism('Cl2 + hν -> Cl•');
    expect(formatReport(analysis, 'one.steps')).toContain('NOT balanced, initiation, molecularity 1, no ΔH (not balanced)');
    // Nor is it used in a route, whose net reaction would be as unbalanced as the step.
    expect(analysis.routes).toEqual([]);
    expect(analysis.diagnostics.map((item) => item.code)).toContain('steps-left-out-of-routes');
  });

  it('rebalances every coefficient when one set of whole numbers does it and no single change can', () => {
    // Balanced combustion and water formation: textbook stoichiometry (common practice).
    expect(fixes('CH4 + O2 -> CO2 + H2O')).toEqual(['CH4 + 2 O2 → CO2 + 2 H2O']);
    expect(fixes('H2 + O2 -> H2O')).toEqual(['2 H2 + O2 → 2 H2O']);
    expect(fixes('C3H8 + O2 + M -> CO2 + H2O + M')).toEqual(['C3H8 + 5 O2 + M → 3 CO2 + 4 H2O + M']);
    expect(fixes('MnO4^- + Fe^2+ + H^+ -> Mn^2+ + Fe^3+ + H2O')).toEqual(['MnO4^- + 5 Fe^2+ + 8 H^+ → Mn^2+ + 5 Fe^3+ + 4 H2O']);
    // With two independent sets of coefficients there is no one rebalancing; a single change is offered instead.
    expect(fixes('C + O2 -> CO + CO2')).toEqual(['C + O2 → CO2']);
  });

  it('removes a stray term rather than writing the same species on both sides', () => {
    const messages = (text: string) => suggestedFixes(text).map((item) => item.message);
    // Adding e^- to the reactants would balance the charge too, but leave e^- on both sides.
    const [fewer] = messages('H2O2 -> O2 + 2 H^+ + 3 e^-');
    expect(fewer).toContain('2 e^- instead of 3 e^- among the products: H2O2 → O2 + 2 H^+ + 2 e^-');
    const [stray] = messages('H2O -> H2 + 1/2 O2 + e^-');
    expect(stray).toContain('1 e^- removed from the products: H2O → H2 + 1/2 O2');
  });

  it('matches a reversible step with its reverse as a duplicate', () => {
    const analysis = analyseMechanism('A1: N2O4 <=> 2 NO2•\nA2: 2 NO2• <=> N2O4');
    expect(analysis.diagnostics).toContainEqual(expect.objectContaining({ code: 'duplicate-step', line: 2 }));
  });
});

describe('a step that changes nothing', () => {
  it('is a warning, with hν and M aside; a real change with the same species is not', () => {
    const codes = (text: string) => analyseMechanism(text).diagnostics.map((item) => item.code);
    expect(codes('Q1: NO2• + M -> NO2• + M')).toContain('step-changes-nothing');
    expect(codes('Q1: NO2• + hν -> NO2•')).toContain('step-changes-nothing');
    expect(codes('Q1: 2 NO2• -> NO2• + NO2•')).toContain('step-changes-nothing');
    expect(codes('Q1: O2(a1Δg) + M -> O2 + M')).not.toContain('step-changes-nothing');
    expect(codes('Q1: 2 NO2• -> NO2•')).not.toContain('step-changes-nothing');
    expect(codes('Q1: NO2• + O3 -> NO2• + O3 + O2')).not.toContain('step-changes-nothing');
  });
});
