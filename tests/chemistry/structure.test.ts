import { describe, expect, it } from 'vitest';
import { MF } from 'mf-parser';
import { checkStructureMatches, hillFormula, parseSmiles } from '@api/chemistry/structure';
import { THERMO_RECORDS } from '@api/chemistry/thermo-data';
import { parseThermoKey } from '@api/chemistry/thermo-key';

/** Elements of the written formula read by mf-parser (an outside formula library), and the charge. */
function written(key: string): { elements: Record<string, number>; charge: number } {
  const parts = parseThermoKey(key);
  if (!parts) throw new Error(`not a key: ${key}`);
  const elements = new MF(parts.formula).getInfo().atoms as Record<string, number>;
  const match = /^(\d*)([+-])$/.exec(parts.charge);
  const charge = match ? (match[2] === '-' ? -1 : 1) * Number(match[1] || 1) : 0;
  return { elements, charge };
}

describe('SMILES of the built-in table', () => {
  const withStructure = THERMO_RECORDS.filter((record) => record.smiles !== undefined);

  it('has structures for most species', () => {
    expect(withStructure.length).toBeGreaterThan(90);
  });

  it.each(withStructure.map((record) => [record.key, record.smiles as string]))(
    '%s: %s parses and matches the written formula and charge',
    (key, smiles) => {
      const { elements, charge } = written(key);
      expect(checkStructureMatches(smiles, elements, charge)).toEqual([]);
    },
  );
});

describe('parseSmiles', () => {
  // Formal charges of textbook Lewis structures (Atkins & Jones, Chemical Principles, formal-charge
  // examples for O3 and NO3⁻; Clayden, Organic Chemistry, the nitro group) — from memory.
  it.each([
    ['ozone', '[O-][O+]=O', 'O3', [-1, 1, 0], 0],
    ['nitrate ion', '[O-][N+](=O)[O-]', 'NO3', [-1, 1, 0, -1], -1],
    ['nitromethane', 'C[N+](=O)[O-]', 'CH3NO2', [0, 1, 0, -1], 0],
    ['carbon monoxide', '[C-]#[O+]', 'CO', [-1, 1], 0],
  ])('%s %s: formula %s, formal charges %j, total %i', (_name, smiles, formula, charges, total) => {
    const info = parseSmiles(smiles);
    expect(info.formula).toBe(formula);
    expect(info.formalCharges.map((atom) => atom.charge)).toEqual(charges);
    expect(info.charge).toBe(total);
  });

  it('draws a depiction that shows the formal charges', () => {
    const svg = parseSmiles('[O-][O+]=O', { svgId: 'ozone' }).svg;
    expect(svg.startsWith('<svg id="ozone"')).toBe(true);
    expect(svg).toMatch(/>\+<\/text>/);
    expect(svg).toMatch(/>-<\/text>/);
  });

  // Ground states (common practice): O(³P) has two unpaired electrons, CH3 and OH one each.
  // openchemlib flags bracket atoms short of one bond as doublets and of two as triplets;
  // it flags no bare [H], [C] or [N] atom, which oddElectrons still catches for H and N.
  it.each([
    ['[O]', 2, false],
    ['[CH3]', 1, true],
    ['[OH]', 1, true],
    ['CO[O]', 1, true],
    ['[N]=O', 1, true],
    ['O=O', 0, false],
    ['[H]', 0, true],
    ['[N]', 0, true],
  ])('%s: %i unpaired electrons from openchemlib, odd electron count %s', (smiles, unpaired, odd) => {
    const info = parseSmiles(smiles);
    expect([info.unpairedElectrons, info.oddElectrons]).toEqual([unpaired, odd]);
  });

  it.each([
    ['', 'SMILES does not parse: the string is empty'],
    ['[Xx]', 'SMILES does not parse: SmilesParser: Unknown atom label. position:0'],
    ['C(C', "SMILES does not parse: 1 branch opened with '(' never closed"],
    ['CC)C', "SMILES does not parse: ')' at position 3 closes no branch"],
    ['C(=O)(=O)(=O)=O', 'SMILES does not parse: atom 1 (C) has more bonds than its valence allows'],
  ])('rejects %j: %s', (smiles, message) => {
    expect(() => parseSmiles(smiles)).toThrow(message);
  });
});

describe('checkStructureMatches', () => {
  it('reports a formula mismatch with both formulas', () => {
    expect(checkStructureMatches('O=Cl[O]', { Cl: 1, O: 1 }, 0)).toEqual([
      'formula mismatch: the structure O=Cl[O] is ClO2, the written formula is ClO',
    ]);
  });

  it('reports a charge mismatch', () => {
    expect(checkStructureMatches('[Cl-]', { Cl: 1 }, 0)).toEqual([
      'charge mismatch: the structure [Cl-] has charge -1, the written species has charge 0',
    ]);
  });

  it('passes the parse error on as its one message', () => {
    expect(checkStructureMatches('C1CC', { C: 3, H: 6 }, 0)).toEqual([
      'SMILES does not parse: SmilesParser: dangling ring closure: 1; position:4',
    ]);
  });
});

describe('hillFormula', () => {
  // Hill system (Hill, J. Am. Chem. Soc. 22 (1900) 478; common practice): C, H, then alphabetical.
  it.each([
    [{ O: 2, C: 1 }, 'CO2'],
    [{ O: 1, H: 2 }, 'H2O'],
    [{ Br: 1, N: 1, O: 3 }, 'BrNO3'],
    [{ H: 3, C: 2, Cl: 1, O: 0 }, 'C2H3Cl'],
  ])('%o → %s', (elements, formula) => {
    expect(hillFormula(elements)).toBe(formula);
  });
});
