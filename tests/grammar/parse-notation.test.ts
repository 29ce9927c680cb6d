import { describe, expect, it } from 'vitest';
import { parseMechanism, type SpeciesNode, type StepNode } from '@grammar/parse';

// Each row is one rule of the step notation (shared design: step-notation.md).
function onlyStep(text: string): StepNode {
  const parsed = parseMechanism(text);
  expect(parsed.diagnostics).toEqual([]);
  expect(parsed.steps).toHaveLength(1);
  return parsed.steps[0];
}

function firstSpecies(text: string): SpeciesNode {
  const particle = onlyStep(text).reactants[0].particle;
  expect(particle.kind).toBe('species');
  return particle as SpeciesNode;
}

describe('parseMechanism: accepted notation', () => {
  it.each([
    ['-> one-way', 'A1: O3 -> O2 + O(3P)', false],
    ['→ one-way', 'O3 → O2 + O(3P)', false],
    ['<=> reversible', 'N2O4 <=> 2 NO2', true],
    ['⇌ reversible', 'N2O4 ⇌ 2 NO2', true],
  ])('reads the %s arrow', (_name, line, reversible) => {
    expect(onlyStep(line).reversible).toBe(reversible);
  });

  it.each([
    ['an integer', '2 NO2 -> N2O4', '2'],
    ['a decimal', '0.5 O2 + CO -> CO2', '0.5'],
    ['a fraction', '1/2 O2 + CO -> CO2', '1/2'],
  ])('reads a coefficient written as %s', (_name, line, text) => {
    expect(onlyStep(line).reactants[0].coefficient?.text).toBe(text);
  });

  it('reads labels with letters, digits, _, - and .', () => {
    expect(onlyStep('R2a_b-c.1: O3 -> O2 + O(3P)').label).toEqual({ text: 'R2a_b-c.1', line: 1, column: 1 });
  });

  it('reads nested groups with counts in round and square brackets', () => {
    const species = firstSpecies('[Pt(NH3)2Cl2]^2+ + (CH3)3COH -> X');
    expect(species.formulaText).toBe('[Pt(NH3)2Cl2]');
    expect(species.formula[0]).toMatchObject({ kind: 'group', bracket: '[' });
    expect(species.charge?.text).toBe('^2+');
  });

  it.each([['O(1D)'], ['O(3P)'], ['O2(a1Δg)'], ['N2(v)'], ['Br2(g)'], ['Cl(aq)^-']])('reads the state tag in %s', (written) => {
    const species = firstSpecies(`${written} -> X`);
    expect(species.states).toHaveLength(1);
  });

  it.each([
    ['Br•', 1, 0, 0],
    ['Br.', 1, 0, 0],
    ['O••', 2, 0, 0],
    ['Fe^3+', 0, 3, 0],
    ['SO4^2-', 0, -2, 0],
    ['CO*', 0, 0, 1],
    ['O2*2', 0, 0, 2],
    ['OH•^-*', 1, -1, 1],
  ])('reads the marks of %s', (written, radicalMarks, charge, sites) => {
    const species = firstSpecies(`${written} -> X`);
    expect(species.radicalMarks).toBe(radicalMarks);
    expect(species.sites).toBe(sites);
    const chargeText = species.charge?.text ?? '';
    const sign = chargeText.endsWith('-') ? -1 : 1;
    expect(chargeText === '' ? 0 : sign * Number(chargeText.slice(1, -1) || 1)).toBe(charge);
  });

  it.each([
    ['hν', 'photon'],
    ['hv', 'photon'],
    ['M', 'third-body'],
    ['*', 'site'],
    ['e^-', 'electron'],
  ])('reads the reserved word %s', (word, kind) => {
    expect(onlyStep(`${word} + X -> Y`).reactants[0].particle.kind).toBe(kind);
  });

  it('keeps Mg and Mn as formulas, not the third body', () => {
    expect(onlyStep('Mg + Mn -> MgMn').reactants.map((term) => term.particle.kind)).toEqual(['species', 'species']);
  });

  it('reads one rate expression, or two for a reversible step, and stops at a comment', () => {
    expect(onlyStep('A1: O3 -> O2 + O(3P) @ 1.7e-11 * exp(-800 / T)   # note').rate).toMatchObject({ forward: '1.7e-11 * exp(-800 / T)', reverse: null, column: 22 });
    expect(onlyStep('N2O4 <=> 2 NO2 @ 1e6 | 2e9 * exp(-100/T)').rate).toMatchObject({ forward: '1e6', reverse: '2e9 * exp(-100/T)' });
  });

  it('ignores comments and blank lines', () => {
    expect(parseMechanism('# only a comment\n\n   \n  # another').steps).toEqual([]);
    expect(parseMechanism('# only a comment\n\n').diagnostics).toEqual([]);
  });

  it('reads every directive', () => {
    const text = ['%title Salt-lake bromine', '%units conc = mol L^-1, time = s', '%conditions T = 275 K, P = 1 atm, M = 2.46e19', '%terminal O3, O2', '%intermediates Br•, *', '%species RO2 = C2H5O2•', '%species Enz'].join('\n');
    const parsed = parseMechanism(text);
    expect(parsed.diagnostics).toEqual([]);
    expect(parsed.directives.map((d) => d.kind)).toEqual(['title', 'units', 'conditions', 'terminal', 'intermediates', 'declaration', 'declaration']);
    expect(parsed.directives[2]).toMatchObject({ assignments: [{ key: { text: 'T' }, value: { text: '275 K' } }, { key: { text: 'P' } }, { key: { text: 'M' }, value: { text: '2.46e19' } }] });
  });

  it('gives the same tree for a line whether or not a line of the same shape came before', () => {
    const alone = parseMechanism('Q7: Cl• + CH4 -> HCl + CH3• @ 7.1e-12').steps[0];
    const afterOthers = parseMechanism('P1: Br• + O3 -> BrO• + O2 @ 1e-11\nQ7: Cl• + CH4 -> HCl + CH3• @ 7.1e-12').steps[1];
    expect(JSON.parse(JSON.stringify(afterOthers).replaceAll('"line":2', '"line":1'))).toEqual(alone);
    expect(afterOthers.reactants.map((t) => t.particle.kind === 'species' && t.particle.text)).toEqual(['Cl•', 'CH4']);
  });
});

describe('parseMechanism: rejected notation', () => {
  it.each([
    ['a missing product side', 'O3 ->', 'syntax-error', 6],
    ['a trailing plus', 'Cl + O3 -> ClO + O2 +', 'syntax-error', 22],
    ['two arrows', 'A -> B -> C', 'syntax-error', 8],
    ['an empty rate', 'A -> B @', 'syntax-error', 9],
    ['a stray character', 'Br $ O -> X', 'syntax-error', 4],
    ['a blank inside a species', 'C H3 + O -> X', 'syntax-error', 2],
    ['two charges', 'Fe^2+^+ -> X', 'syntax-error', 6],
    ['two adsorbed marks', 'CO** -> X', 'syntax-error', 4],
    ['an unclosed bracket', '(CH3 + OH -> X', 'unbalanced-brackets', 1],
    ['a stray closing bracket', 'CH3) + OH -> X', 'unbalanced-brackets', 4],
    ['a crossed bracket', '[Pt(NH3]) -> X', 'unbalanced-brackets', 8],
    ['an unknown directive', '%colour blue', 'unknown-directive', 1],
    ['a label without a step', 'R1:', 'syntax-error', 4],
    ['M inside a formula group', '(M)2 -> X', 'syntax-error', 2],
  ])('reports %s', (_name, line, code, column) => {
    const { diagnostics } = parseMechanism(line);
    expect(diagnostics[0]).toMatchObject({ severity: 'error', line: 1, column, code });
    expect(diagnostics[0].message.length).toBeGreaterThan(10);
    expect(diagnostics[0].found).toBeTruthy();
  });

  it('reports a line with a species error found while converting, and does not hand on its step', () => {
    const parsed = parseMechanism('C H3 + O -> X\nO3 -> O2 + O(3P)\nFe^2+^3+ -> Fe^3+ + e^-');
    expect(parsed.diagnostics.map((item) => item.line)).toEqual([1, 3]);
    expect(parsed.steps.map((step) => step.line)).toEqual([2]);
  });

  it('says what it expected at a syntax error', () => {
    const [error] = parseMechanism('A + -> B').diagnostics;
    expect(error).toMatchObject({ column: 5, found: '->' });
    expect(error.expected).toEqual(expect.arrayContaining(['a formula or declared name', 'hν', 'M', "'*'"]));
  });

  it('names what it expected in plain words, never a token type of the lexer', () => {
    const [error] = parseMechanism('-> O2').diagnostics;
    expect(error).toMatchObject({ column: 1, found: '->' });
    expect(error.expected).toContain('a directive (%title, %units, %conditions, %terminal, %intermediates, %species)');
    for (const item of error.expected ?? []) expect(item).not.toMatch(/^[a-z]+[A-Z][A-Za-z]*$/);
  });

  it('says what to write for look-alike characters copied from papers', () => {
    const message = (line: string) => parseMechanism(line).diagnostics[0]?.message ?? '';
    expect(message('Br· + O3 -> BrO· + O2')).toContain("(write '•' for '·')");
    expect(message('O3 ⟶ O2 + O(3P)')).toContain("(write '→' for '⟶')");
    expect(message('Cl• + O3 = ClO• + O2')).toContain("(write '->' for '=')");
    expect(message('O3 + hν -> O2 + O(¹D)')).toContain("(write '1' for '¹')");
    expect(message('%conditions T == 298 K')).toBe("unexpected '='; expected a value");
    // Runs are read whole: a superscript charge, subscript counts, a Unicode minus in a charge or an arrow.
    expect(message('Fe³⁺ + e^- -> Fe²⁺')).toContain("(write '^3+' for '³⁺')");
    expect(message('CO2 + H₂O -> H2CO3')).toContain("(write '2' for '₂')");
    expect(message('O2^− + H^+ -> HO2•')).toContain("(write '^-' for '^−')");
    expect(message('O3 + hν −> O2 + O(1D)')).toContain("(write '->' for '−>')");
    // A character outside the Basic Multilingual Plane is shown whole (mathematical italic nu).
    expect(message('O3 + h\u{1D708} -> O2 + O(1D)')).toContain("unexpected character '\u{1D708}' (write 'ν' for '\u{1D708}')");
    // Characters that cannot be seen are named by their code point.
    expect(message('O3\u00a0+ hν -> O2 + O(3P)')).toContain('unexpected character U+00A0 (write a plain space for U+00A0)');
    expect(message('O3 \u0001 -> O2 + O(3P)')).toContain('unexpected character U+0001;');
  });

  it('says a reserved word cannot be a name, only where a name was wanted', () => {
    const message = (line: string) => parseMechanism(line).diagnostics[0]?.message ?? '';
    expect(message('%species M = N2')).toBe("unexpected 'M' (M is reserved: any third body); expected a formula or declared name");
    expect(message('%species hv')).toContain('(hv is reserved: a photon)');
    expect(message('O + M M -> O + M')).toBe("unexpected 'M'; expected '+', an arrow (->, →, <=>, ⇌)");
  });

  it('says a coefficient in scientific notation is not one, at the coefficient, once per coefficient', () => {
    const found = (line: string) => parseMechanism(line).diagnostics.map((d) => [d.column, d.message.split(';')[0]]);
    expect(found('A1: 1e400 O2 -> 2e400 O(3P)')).toEqual([[5, 'coefficient 1e400 is in scientific notation'], [17, 'coefficient 2e400 is in scientific notation']]);
    expect(found('1e-3 O2 -> 2e-3 O(3P)')).toEqual([[1, 'coefficient 1e-3 is in scientific notation']]);
    // In a rate expression scientific notation is what is written.
    expect(parseMechanism('O3 + hν -> O2 + O(3P) @ 1e-5').diagnostics).toEqual([]);
  });

  it('says when a step has no arrow at all', () => {
    const [error] = parseMechanism('Cl• + O3 ClO• + O2').diagnostics;
    expect(error.message).toContain('the step has no arrow between its reactants and products');
    expect(parseMechanism('Cl• + O3 -> ClO• +').diagnostics[0].message).not.toContain('no arrow');
  });

  it('reports a line that is too long without reading it', () => {
    const [error] = parseMechanism(`A -> B @ ${'1+'.repeat(2_000)}1`).diagnostics;
    expect(error).toMatchObject({ code: 'line-too-long', line: 1 });
  });

  it('reads a step whose trailing comment makes the line long', () => {
    const parsed = parseMechanism(`R1: O3 + hν -> O2 + O(1D) # ${'x'.repeat(3_000)}`);
    expect(parsed.diagnostics).toEqual([]);
    expect(parsed.steps).toHaveLength(1);
  });

  it('reads every line of a lumped mechanism whose lines nearly all have their own shape', () => {
    const forms = ['C2H5O2', '0.25 C2H5O2', 'C2H5O2•', 'C2H5O2(aq)', '(CH3)2CHO2•', 'Fe^3+', 'CO*', 'O(1D)•'];
    // Each line's terms spell its index in base 8, so no two lines share a token-type sequence.
    const lines = Array.from({ length: 12_000 }, (_, index) => {
      const terms = index.toString(8).padStart(5, '0').split('').map((digit) => forms[Number(digit)]);
      return `L${index}: ${terms[0]} + ${terms[1]} -> ${terms.slice(2).join(' + ')} @ 1e-12`;
    });
    const parsed = parseMechanism(lines.join('\n'));
    expect(parsed.diagnostics).toEqual([]);
    expect(parsed.steps).toHaveLength(12_000);
  });

  it('bounds the work on one line: too many tokens, or brackets nested too deep', () => {
    expect(parseMechanism(`${'O•'.repeat(400)} -> O2`).diagnostics[0]).toMatchObject({ code: 'line-too-long', line: 1 });
    expect(parseMechanism(`${'('.repeat(9)}CH3${')'.repeat(9)} -> CH3`).diagnostics[0]).toMatchObject({ code: 'syntax-error', column: 9 });
    expect(parseMechanism(`${'('.repeat(8)}CH3${')'.repeat(8)} -> CH3`).diagnostics).toEqual([]);
  });

  it('reports a text that is too large and reads none of it', () => {
    const parsed = parseMechanism('A -> B\n'.repeat(1_200_000));
    expect(parsed.steps).toEqual([]);
    expect(parsed.diagnostics).toEqual([expect.objectContaining({ code: 'input-too-large', line: 1, column: 1 })]);
  });
});

describe('parseMechanism: error recovery', () => {
  it('reports every faulty line in one pass and keeps the good ones', () => {
    const text = ['B1: Br• + O3 -> BrO• + O2', 'B2: BrO• + -> Br•', 'B3: BrO• + hν -> Br• + O(3P)', 'B4: (O -> O2', '%nope', 'B5: Br2 + hν -> 2 Br•'].join('\r\n');
    const parsed = parseMechanism(text);
    expect(parsed.steps.map((step) => step.label?.text)).toEqual(['B1', 'B3', 'B5']);
    expect(parsed.diagnostics.map((d) => [d.line, d.code])).toEqual([[2, 'syntax-error'], [4, 'unbalanced-brackets'], [5, 'unknown-directive']]);
  });
});
