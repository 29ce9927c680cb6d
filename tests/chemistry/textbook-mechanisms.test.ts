import { describe, expect, it } from 'vitest';
import { analyseMechanism, type MechanismAnalysis } from '@api/chemistry/analyse';
import { exampleText } from '../helpers/examples';

function roles(analysis: MechanismAnalysis): Record<string, string> {
  return Object.fromEntries(analysis.species.map((species) => [species.key, species.role]));
}

function productive(analysis: MechanismAnalysis) {
  return analysis.routes.filter((route) => route.kind === 'productive');
}

describe('textbook mechanisms: net reactions, stoichiometric numbers and roles', () => {
  // Catalytic ozone loss by NOx: NO + O3 → NO2 + O2; NO2 + O → NO + O2; net O3 + O → 2 O2.
  // Finlayson-Pitts & Pitts, Chemistry of the Upper and Lower Atmosphere (2000), ch. 12 (from memory).
  it('NOx cycle: O3 + O → 2 O2 with σ = (1, 1), NO the catalyst and NO2 the intermediate', () => {
    const analysis = analyseMechanism('N1: NO + O3 -> NO2 + O2\nN2: NO2 + O -> NO + O2');
    expect(analysis.routes).toHaveLength(1);
    expect(analysis.routes[0]).toMatchObject({ multipliers: { N1: 1, N2: 1 }, netSpecies: { O3: -1, O: -1, O2: 2 }, kind: 'productive' });
    expect(roles(analysis)).toMatchObject({ NO: 'catalyst', NO2: 'intermediate', O3: 'reactant', O: 'reactant', O2: 'product' });
  });

  // Chapman oxygen-only chemistry plus the NOx cycle: with O2 and O3 terminal, every productive route
  // turns 2 O3 into 3 O2 except photolytic ozone production 3 O2 → 2 O3 (same book, ch. 12; from memory).
  it('Chapman + NOx (examples/stratospheric-nox.steps): the routes interconvert O2 and O3 only', () => {
    const analysis = analyseMechanism(exampleText('stratospheric-nox.steps'));
    expect(analysis.intermediates).toEqual(['O(3P)', 'NO•', 'NO2•']);
    const nets = new Set(productive(analysis).map((route) => route.net));
    expect(nets).toEqual(new Set(['2 O3 → 3 O2', '3 O2 → 2 O3']));
    expect(analysis.routes).toContainEqual(expect.objectContaining({ multipliers: { C3: 1, N1: 1, N2: 1 }, net: '2 O3 → 3 O2', direct: true }));
    expect(roles(analysis)).toMatchObject({ 'NO•': 'catalyst', 'NO2•': 'intermediate', 'O(3P)': 'intermediate' });
  });

  // ClO dimer cycle: ClO + ClO + M → Cl2O2 + M; Cl2O2 + hν → Cl + ClOO; ClOO + M → Cl + O2 + M;
  // 2 (Cl + O3 → ClO + O2); net 2 O3 → 3 O2. Molina & Molina, J. Phys. Chem. 91 (1987) 433;
  // Seinfeld & Pandis, Atmospheric Chemistry and Physics, ch. 5 (from memory).
  it('ClO dimer cycle (examples/clo-dimer.steps): 2 O3 → 3 O2 with σ = (1, 1, 1, 2)', () => {
    const analysis = analyseMechanism(exampleText('clo-dimer.steps'));
    expect(analysis.routes).toHaveLength(1);
    expect(analysis.routes[0]).toMatchObject({ multipliers: { D1: 1, D2: 1, D3: 1, D4: 2 }, netSpecies: { O3: -2, O2: 3 }, aside: { hν: -1 } });
    expect(analysis.overall).toBe(0);
    expect(roles(analysis)).toMatchObject({ 'ClO•': 'catalyst', Cl2O2: 'intermediate', 'Cl•': 'intermediate', 'ClOO•': 'intermediate', M: 'third-body', hν: 'photon' });
    // Net 2 O3 → 3 O2: ΔH = −2 × 142.67 kJ/mol (NIST-JANAF ΔfH°(O3, g) = 142.67 kJ/mol, O2 = 0).
    expect(analysis.routes[0].dH).toBeCloseTo(-285.3, 1);
  });

  // Decomposition of N2O5 (Ogg's mechanism): N2O5 ⇌ NO2 + NO3; NO2 + NO3 → NO + O2 + NO2;
  // NO + NO3 → 2 NO2; net 2 N2O5 → 4 NO2 + O2 with σ = (2, 1, 1). Atkins' Physical Chemistry,
  // "Complex reactions" (from memory).
  it('N2O5 decomposition: 2 N2O5 → 4 NO2 + O2 with NO3 and NO the intermediates', () => {
    const analysis = analyseMechanism('Z1: N2O5 <=> NO2 + NO3\nZ2: NO2 + NO3 -> NO + O2 + NO2\nZ3: NO + NO3 -> 2 NO2');
    expect(analysis.intermediates).toEqual(['NO3', 'NO']);
    expect(productive(analysis)).toEqual([expect.objectContaining({ multipliers: { Z1: 2, Z2: 1, Z3: 1 }, netSpecies: { N2O5: -2, NO2: 4, O2: 1 } })]);
    expect(roles(analysis)).toMatchObject({ N2O5: 'reactant', NO2: 'product', O2: 'product', NO3: 'intermediate', NO: 'intermediate' });
  });

  // H2 + Br2 → 2 HBr chain: initiation, two propagations, inhibition, termination; the chain carriers
  // Br and H cancel. Atkins' Physical Chemistry, "Chain reactions" (from memory).
  it('H2 + Br2 chain (examples/hydrogen-bromine-chain.steps): chain carriers Br• and H•, net H2 + Br2 → 2 HBr', () => {
    const analysis = analyseMechanism(exampleText('hydrogen-bromine-chain.steps'));
    expect(analysis.intermediates).toEqual(['Br•', 'H•']);
    expect(analysis.routes[0]).toMatchObject({ multipliers: { HB2: 1, HB3: 1 }, netSpecies: { Br2: -1, H2: -1, HBr: 2 }, kind: 'productive' });
    expect(analysis.steps.map((step) => step.class)).toEqual(['initiation', 'propagation', 'propagation', 'propagation', 'termination']);
    // ΔrH = 2 ΔfH°(HBr, g) − ΔfH°(Br2, g) = 2(−36.29) − 30.91 = −103.5 kJ/mol (NIST-JANAF).
    expect(analysis.routes[0].dH).toBeCloseTo(-103.5, 1);
  });

  // Michaelis–Menten: E + S ⇌ ES → E + P; the enzyme is regenerated. Atkins' Physical Chemistry,
  // "Enzymes" (from memory).
  it('Michaelis–Menten with declared names (examples/enzyme-isomerase.steps): Enz catalyst, EnzGlc intermediate', () => {
    const analysis = analyseMechanism(exampleText('enzyme-isomerase.steps'));
    expect(analysis.routes).toEqual([expect.objectContaining({ multipliers: { E1: 1, E2: 1 }, net: 'Glc → Fru' })]);
    expect(roles(analysis)).toEqual({ Enz: 'catalyst', Glc: 'reactant', EnzGlc: 'intermediate', Fru: 'product' });
    expect(analysis.species.find((s) => s.key === 'Glc')).toMatchObject({ name: 'Glc', declared: true, opaque: false, elements: { C: 6, H: 12, O: 6 } });
    expect(analysis.species.find((s) => s.key === 'Enz')).toMatchObject({ declared: true, opaque: true });
  });

  // Langmuir–Hinshelwood CO oxidation: CO + * ⇌ CO*, O2 + 2* → 2 O*, CO* + O* → CO2 + 2*;
  // net 2 CO + O2 → 2 CO2 with σ = (2, 1, 2). Chorkendorff & Niemantsverdriet, Concepts of Modern
  // Catalysis and Kinetics (from memory).
  it('Langmuir–Hinshelwood CO oxidation (examples/co-oxidation-surface.steps): σ = (2, 1, 2)', () => {
    const analysis = analyseMechanism(exampleText('co-oxidation-surface.steps'));
    expect(analysis.routes).toEqual([expect.objectContaining({ multipliers: { S1: 2, S2: 1, S3: 2 }, netSpecies: { CO: -2, O2: -1, CO2: 2 } })]);
    expect(roles(analysis)).toMatchObject({ '*': 'site', 'CO*': 'intermediate', 'O*': 'intermediate', CO: 'reactant', CO2: 'product' });
    // 2 CO + O2 → 2 CO2: 2(−393.51) − 2(−110.53) = −565.96 kJ/mol (NIST-JANAF), from the net reaction.
    expect(analysis.routes[0].dH).toBeCloseTo(-566.0, 1);
    expect(analysis.routes[0].dHFromSteps).toBeNull();
  });

  // Iodide-catalysed decomposition: H2O2 + I− → H2O + IO−; H2O2 + IO− → H2O + O2 + I−;
  // net 2 H2O2 → 2 H2O + O2. Atkins' Physical Chemistry, "Homogeneous catalysis" (from memory).
  it('iodide-catalysed H2O2 decomposition (examples/iodide-peroxide.steps): I^- catalyst, IO^- intermediate', () => {
    const analysis = analyseMechanism(exampleText('iodide-peroxide.steps'));
    expect(analysis.routes).toEqual([expect.objectContaining({ multipliers: { I1: 1, I2: 1 }, net: '2 H2O2 → 2 H2O + O2' })]);
    expect(roles(analysis)).toMatchObject({ 'I^-': 'catalyst', 'IO^-': 'intermediate', H2O2: 'reactant' });
    // 2 H2O2(g) → 2 H2O(g) + O2: 2(−241.826) − 2(−136.31) = −211.03 kJ/mol (CODATA key value for H2O;
    // NBS tables, Wagman et al. 1982, for H2O2; both from memory). The ions have no tabulated value,
    // so the route's ΔH comes from its net reaction.
    expect(analysis.routes[0].dH).toBeCloseTo(-211.03, 2);
    expect(analysis.routes[0].dHFromSteps).toBeNull();
  });

  // The bromine cycle of step-notation.md: 2 (Br + O3 → BrO + O2) + (2 BrO → 2 Br + O2): net 2 O3 → 3 O2.
  // Finlayson-Pitts & Pitts, ch. 6 and 12 (from memory).
  it('salt-lake bromine cycle (examples/salt-lake-bromine.steps): σ(B1) = 2, σ(B2) = 1', () => {
    const analysis = analyseMechanism(exampleText('salt-lake-bromine.steps'));
    expect(analysis.routes[0]).toMatchObject({ multipliers: { B1: 2, B2: 1 }, net: '2 O3 → 3 O2', direct: true });
    expect(analysis.routes[0].dH).toBeCloseTo(-285.3, 1);
    expect(roles(analysis)).toMatchObject({ 'Br•': 'catalyst', 'BrO•': 'intermediate', Br2: 'unused' });
  });

  // Step classes by radical count. In catalytic ozone loss the atom O(3P), written without marks, is
  // odd oxygen and not a chain carrier: ClO + O → Cl + O2 propagates the chlorine chain
  // (Finlayson-Pitts & Pitts, ch. 12, from memory). In hydrogen–oxygen combustion the author marks
  // the triplet atom's two unpaired electrons, and H + O2 → OH + O and O + H2 → OH + H branch the
  // chain while OH + H2 → H2O + H propagates it (Warnatz, Maas & Dibble, Combustion, ch. 5; from memory).
  it('step classes: the chlorine cycle propagates; marked O(3P)•• makes the hydrogen–oxygen steps branch', () => {
    const chlorine = analyseMechanism('K1: Cl• + O3 -> ClO• + O2\nK2: ClO• + O(3P) -> Cl• + O2');
    expect(chlorine.steps.map((step) => step.class)).toEqual(['propagation', 'propagation']);
    const combustion = analyseMechanism('H1: H• + O2 -> OH• + O(3P)••\nH2: O(3P)•• + H2 -> OH• + H•\nH3: OH• + H2 -> H2O + H•');
    expect(combustion.steps.map((step) => step.class)).toEqual(['branching', 'branching', 'propagation']);
    expect(combustion.diagnostics.filter((item) => item.severity !== 'info')).toEqual([]);
  });
});
