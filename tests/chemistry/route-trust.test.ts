import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { formatReport } from '@api/chemistry/report-text';

const codes = (text: string) => analyseMechanism(text).diagnostics.map((item) => item.code);
const messages = (text: string, code: string) => analyseMechanism(text).diagnostics.filter((item) => item.code === code).map((item) => item.message);

describe('routes are built only from steps without stoichiometry errors', () => {
  // Catalytic ozone loss by chlorine with a slip in the second step (2 O2 for O2).
  const slipped = 'L1: Cl• + O3 -> ClO• + O2\nL2: ClO• + O(3P) -> Cl• + 2 O2\nL3: O3 + hν -> O2 + O(3P)';

  it('leaves the unbalanced step out, says so, and gives no net reaction that creates atoms', () => {
    const analysis = analyseMechanism(slipped);
    expect(analysis.routes.length).toBeGreaterThan(0);
    for (const route of analysis.routes) expect(Object.keys(route.multipliers)).not.toContain('L2');
    expect(messages(slipped, 'steps-left-out-of-routes')[0]).toContain('L2 (line 2)');
    // Every net reaction conserves oxygen (common practice: a net reaction is balanced).
    const oxygen: Record<string, number> = { 'O3': 3, 'O2': 2, 'O(3P)': 1, 'ClO•': 1, 'Cl•': 0 };
    for (const route of analysis.routes) {
      const total = Object.entries(route.netSpecies).reduce((sum, [key, nu]) => sum + nu * oxygen[key], 0);
      expect(total).toBe(0);
    }
  });

  it('gives the textbook net 2 O3 → 3 O2 once the slip is fixed (common practice)', () => {
    const analysis = analyseMechanism(slipped.replace('Cl• + 2 O2', 'Cl• + O2'));
    expect(codes(slipped.replace('Cl• + 2 O2', 'Cl• + O2'))).not.toContain('steps-left-out-of-routes');
    expect(analysis.routes[analysis.overall ?? 0].net).toBe('2 O3 → 3 O2');
  });

  it('leaves out steps with hν among the products, M on one side or a repeated label', () => {
    const text = 'A1: Br2 + hν -> 2 Br•\nA2: Br• + O3 -> BrO• + O2 + hν\nA3: O(3P) + O2 + M -> O3\nA1: BrO• + O(3P) -> Br• + O2';
    const [message] = messages(text, 'steps-left-out-of-routes');
    expect(message).toContain('A2 (line 2)');
    expect(message).toContain('A3 (line 3)');
    expect(message).toContain('A1 (line 4)');
    expect(message).toContain('would not conserve light or third bodies, and would name two steps by one label');
    expect(messages(slipped, 'steps-left-out-of-routes')[0]).toMatch(/would not conserve atoms$/);
    for (const route of analyseMechanism(text).routes) expect(route.aside).toEqual(expect.not.objectContaining({ 'hν': expect.any(Number) as number, 'M': expect.any(Number) as number }));
  });

  it('has no routes when every step is faulty, and says why', () => {
    const analysis = analyseMechanism('Cl2 + hν -> Cl•');
    expect(analysis.routes).toEqual([]);
    expect(analysis.intermediatesExplanation).toContain('Every step has an error');
  });
});

describe('a route that runs a one-way step backwards', () => {
  // An open H2/O2 chain without termination (common practice: σ of a one-way step is never negative).
  const open = 'R1: H2 + O2 -> HO2• + H•\nR2: H• + O2 -> OH• + O(3P)\nR3: O(3P) + H2 -> OH• + H•\nR4: OH• + H2 -> H2O + H•';

  // With H• pinned as an intermediate, every route that cancels it runs the initiation R1 backwards.
  const pinned = `%intermediates H•, OH•, O(3P)\n${open}`;

  it('is flagged with the steps it reverses, in the JSON, the report and a warning', () => {
    const analysis = analyseMechanism(pinned);
    const reversing = analysis.routes.filter((route) => route.reversesOneWay.length > 0);
    expect(reversing.length).toBeGreaterThan(0);
    expect(reversing[0].reversesOneWay).toContain('R1');
    expect(reversing[0].multipliers.R1).toBeLessThan(0);
    expect(formatReport(analysis, 'open.steps')).toContain('runs R1 backwards');
    expect(messages(pinned, 'route-reverses-one-way-step')[0]).toContain('no productive route runs every one-way step forwards');
  });

  it('is avoided when not pinned: H• is released and the branching cycle shows the radicals it makes', () => {
    const analysis = analyseMechanism(open);
    expect(analysis.intermediates).toEqual(['OH•', 'O(3P)']);
    expect(analysis.intermediatesExplanation).toContain('H• (first met on line 1) is released');
    // R2 + R3 + 2 R4: H atoms 2 + 3·2 = 2 + 2·2 (common practice: chain branching multiplies H•).
    expect(analysis.routes.map((route) => route.net)).toContain('3 H2 + O2 → 2 H• + 2 H2O');
    for (const route of analysis.routes) expect(route.reversesOneWay).toEqual([]);
  });

  it('is avoided when every reaction is written as two one-way steps, with or without the direct routes listed', () => {
    // Hydrogen–oxygen reactions (common practice), each written forwards (F) and backwards (B).
    const reactions = [
      'H• + O2 -> OH• + O(3P)', 'O(3P) + H2 -> OH• + H•', 'OH• + H2 -> H2O + H•', 'OH• + OH• -> H2O + O(3P)',
      'H2 + M -> H• + H• + M', 'O2 + M -> O(3P) + O(3P) + M', 'OH• + M -> O(3P) + H• + M', 'H2O + M -> H• + OH• + M',
      'H• + O2 + M -> HO2• + M', 'HO2• + H• -> H2 + O2', 'HO2• + H• -> OH• + OH•', 'HO2• + O(3P) -> O2 + OH•',
      'HO2• + OH• -> H2O + O2', 'HO2• + HO2• -> H2O2 + O2', 'H2O2 + M -> OH• + OH• + M', 'H2O2 + H• -> H2O + OH•',
      'H2O2 + H• -> HO2• + H2', 'H2O2 + O(3P) -> OH• + HO2•', 'H2O2 + OH• -> H2O + HO2•', 'HO2• + H• -> H2O + O(3P)',
      'O(3P) + OH• + M -> HO2• + M',
    ];
    const pairs = (count: number) => reactions.slice(0, count).flatMap((reaction, index) => {
      const [left, right] = reaction.split(' -> ');
      return [`F${index + 1}: ${reaction}`, `B${index + 1}: ${right} -> ${left}`];
    }).join('\n');
    // 42 steps: routes from the exact basis alone; 20 steps: the direct routes are listed too.
    for (const text of [pairs(21), pairs(10)]) {
      const analysis = analyseMechanism(text);
      expect(analysis.routes.length).toBeGreaterThan(0);
      for (const route of analysis.routes) expect(route.reversesOneWay).toEqual([]);
      expect(analysis.overall).not.toBeNull();
    }
  });

  it('is never flagged when the one-way steps run forwards (Chapman, common practice)', () => {
    const chapman = 'C1: O2 + hν -> 2 O(3P)\nC2: O(3P) + O2 + M -> O3 + M\nC3: O3 + hν -> O2 + O(3P)\nC4: O(3P) + O3 -> 2 O2';
    const analysis = analyseMechanism(chapman);
    for (const route of analysis.routes.filter((item) => item.kind === 'productive')) {
      const negative = Object.entries(route.multipliers).filter(([, sigma]) => sigma < 0).map(([id]) => id);
      expect(route.reversesOneWay).toEqual(negative);
    }
    const reversible = analyseMechanism('E1: N2O4 <=> 2 NO2•\nE2: NO2• + NO2• -> N2O4');
    for (const route of reversible.routes) expect(route.reversesOneWay).not.toContain('E1');
  });
});

describe('chain carriers', () => {
  it('are Br• and H• in the hydrogen–bromine chain (Atkins, Physical Chemistry, from memory)', () => {
    const text = [
      'B1: Br2 + M -> 2 Br• + M',
      'B2: Br• + H2 -> HBr + H•',
      'B3: H• + Br2 -> HBr + Br•',
      'B4: H• + HBr -> H2 + Br•',
      'B5: 2 Br• + M -> Br2 + M',
    ].join('\n');
    const analysis = analyseMechanism(text);
    expect(analysis.chainCarriers).toEqual(['Br•', 'H•']);
    expect(formatReport(analysis, 'hbr.steps')).toContain('Chain carriers: Br•, H•');
  });

  it('leave out a radical that a step only passes through (N2O5 decomposition, common practice)', () => {
    // NO2• is on both sides of R2 in the same amount: that step neither consumes nor forms it.
    const text = 'R1: N2O5 <=> NO2• + NO3•\nR2: NO3• + NO2• -> NO• + NO2• + O2\nR3: NO• + NO3• -> 2 NO2•';
    expect(analyseMechanism(text).chainCarriers).toEqual(['NO•']);
  });

  it('are Cl• and ClO• in catalytic ozone loss by chlorine (common practice)', () => {
    expect(analyseMechanism('Cl• + O3 -> ClO• + O2\nClO• + O(3P) -> Cl• + O2\nO3 + hν -> O2 + O(3P)').chainCarriers).toEqual(['Cl•', 'ClO•']);
  });

  it('are none where no radical is passed on, and a radical made only by initiation is none', () => {
    expect(analyseMechanism('N2O5 -> NO2• + NO3•\nNO2• + NO3• -> N2O5').chainCarriers).toEqual([]);
    expect(analyseMechanism('H2 + I2 -> 2 HI').chainCarriers).toEqual([]);
  });
});

describe('one species written two ways', () => {
  it('warns for O beside O(3P), and for CH3 beside CH3•', () => {
    expect(messages('O3 + hν -> O2 + O(3P)\nO + O3 -> 2 O2', 'species-two-spellings')[0]).toContain('O and O(3P) (line 1)');
    expect(codes('CH3 + O2 -> CH3O2•\nCH3• + CH3• -> C2H6')).toContain('species-two-spellings');
  });

  it('does not warn for an excited state, isomers or declared names', () => {
    expect(codes('O3 + hν -> O2 + O(1D)\nO(1D) + M -> O(3P) + M')).not.toContain('species-two-spellings');
    expect(codes('CH3CHO + OH• -> CH3CO• + H2O\nC2H4O + OH• -> C2H3O• + H2O')).not.toContain('species-two-spellings');
    expect(codes('%species Ane = C2H6\n%species AneHot = C2H6\nAne + M <=> AneHot + M\nAneHot -> C2H4 + H2')).not.toContain('species-two-spellings');
  });
});

describe('suggested fixes a chemist would make', () => {
  const fix = (text: string) => messages(text, 'suggested-fix')[0] ?? '';

  it('takes the smallest single change (2 O2 → O2 rather than 3 O(3P))', () => {
    expect(fix('ClO• + O(3P) -> Cl• + 2 O2')).toContain('ClO• + O(3P) → Cl• + O2');
  });

  it('gives a species its missing charge instead of a free electron', () => {
    expect(fix('H2O2(aq) + I(aq)^- -> H2O(l) + IO(aq)')).toContain('IO(aq)^- instead of IO(aq)');
    expect(fix('H2O2(aq) + I(aq)^- -> H2O(l) + IO(aq)\nH2O2(aq) + IO(aq)^- -> H2O(l) + O2(g) + I(aq)^-')).toContain('H2O(l) + IO(aq)^-');
  });

  it('still adds an electron to a half-reaction, and never writes one species on both sides', () => {
    expect(fix('Fe^3+ -> Fe^2+')).toContain('Fe^3+ + e^- → Fe^2+');
    expect(fix('Fe^3+ -> Fe^2+')).not.toContain('Fe^2+ → Fe^2+');
  });
});

describe('roles and wording', () => {
  it('gives a pinned intermediate that no productive route uses the role intermediate, not unused', () => {
    const text = '%intermediates O(3P), O3\nC1: O2 + hν -> 2 O(3P)\nC2: O(3P) + O2 + M -> O3 + M\nC3: O3 + hν -> O2 + O(3P)\nC4: O(3P) + O3 -> 2 O2';
    const roles = Object.fromEntries(analyseMechanism(text).species.map((item) => [item.key, item.role]));
    expect(roles['O(3P)']).toBe('intermediate');
    expect(roles.O3).toBe('intermediate');
  });

  it('puts the suggested radical mark after the state tag, and names a whole unknown word once', () => {
    expect(messages('H2O2(aq) + I(aq)^- -> H2O(l) + IO(aq)^-\nIO(aq) + O3(aq) -> IO2(aq) + O2(aq)', 'odd-electrons-unmarked').join(' ')).toContain('(IO(aq)•)');
    expect(messages('Qz + O2 -> QzO2', 'unknown-element')[0]).toMatch(/^Qz is not an element symbol/);
    expect(messages('CO + * -> CO*', 'enthalpy-missing')[0]).toMatch(/with (it|them) is left empty/);
  });

  it('says "none" for an empty list of roles', () => {
    expect(formatReport(analyseMechanism('# nothing yet'), 'empty.steps')).toContain('Roles: none');
  });
});
