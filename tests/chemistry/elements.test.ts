import { describe, expect, it } from 'vitest';
import { elements as referenceElements } from 'chemical-elements';
import { ELEMENTS, elementBySymbol, molarMass } from '@api/chemistry/elements';

// IUPAC/CIAAW 2021 abridged standard atomic weights (five significant figures; Prohaska et al.,
// Pure Appl. Chem. 94 (2022) 573, table of abridged values), from memory. Our value must round to it.
const IUPAC_2021_ABRIDGED: [string, number, number][] = [
  ['H', 1.008, 0.0005], ['He', 4.0026, 0.00005], ['Li', 6.94, 0.005], ['Be', 9.0122, 0.00005],
  ['B', 10.81, 0.005], ['C', 12.011, 0.0005], ['N', 14.007, 0.0005], ['O', 15.999, 0.0005],
  ['F', 18.998, 0.0005], ['Ne', 20.18, 0.0005], ['Na', 22.99, 0.0005], ['Mg', 24.305, 0.0005],
  ['Al', 26.982, 0.0005], ['Si', 28.085, 0.0005], ['P', 30.974, 0.0005], ['S', 32.06, 0.005],
  ['Cl', 35.45, 0.005], ['Ar', 39.95, 0.005], ['K', 39.098, 0.0005], ['Ca', 40.078, 0.0005],
  ['Ti', 47.867, 0.0005], ['Cr', 51.996, 0.0005], ['Mn', 54.938, 0.0005], ['Fe', 55.845, 0.0005],
  ['Co', 58.933, 0.0005], ['Ni', 58.693, 0.0005], ['Cu', 63.546, 0.0005], ['Zn', 65.38, 0.005],
  ['As', 74.922, 0.0005], ['Se', 78.971, 0.0005], ['Br', 79.904, 0.0005], ['Kr', 83.798, 0.0005],
  ['Mo', 95.95, 0.005], ['Ru', 101.07, 0.005], ['Rh', 102.91, 0.005], ['Pd', 106.42, 0.005],
  ['Ag', 107.87, 0.005], ['Sn', 118.71, 0.005], ['I', 126.9, 0.005], ['Xe', 131.29, 0.005],
  ['Cs', 132.91, 0.005], ['Ce', 140.12, 0.005], ['W', 183.84, 0.005], ['Ir', 192.22, 0.005],
  ['Pt', 195.08, 0.005], ['Au', 196.97, 0.005], ['Hg', 200.59, 0.005], ['Pb', 207.2, 0.05],
  ['Bi', 208.98, 0.005], ['Th', 232.04, 0.005], ['U', 238.03, 0.005],
];

// Looked up: the changes listed in the abstracts of "Standard atomic weights of the elements 2021"
// (Prohaska et al., Pure Appl. Chem. 94 (2022) 573) and "Atomic weights of the elements 2013"
// (Meija et al., Pure Appl. Chem. 88 (2016) 265; isotopic-abundance revisions kept in 2021).
const CIAAW_REVISIONS: [string, number][] = [
  ['Hf', 178.486], ['Ir', 192.217], ['Yb', 173.045], ['Cd', 112.414], ['Mo', 95.95], ['Se', 78.971], ['Th', 232.0377],
];

// 2021 report: argon [39.792, 39.963] and lead [206.14, 207.94] became intervals.
const CIAAW_2021_INTERVALS: [string, number, number][] = [['Ar', 39.792, 39.963], ['Pb', 206.14, 207.94]];

// IUPAC periodic table: mass number of the longest-lived isotope, in brackets (from memory).
const MASS_NUMBERS: [string, number][] = [
  ['Tc', 97], ['Pm', 145], ['Po', 209], ['Rn', 222], ['Ra', 226], ['Pu', 244], ['Og', 294],
];

describe('ELEMENTS', () => {
  it('lists all 118 elements once, in order of atomic number', () => {
    expect(ELEMENTS).toHaveLength(118);
    expect(ELEMENTS.map((e) => e.z)).toEqual(Array.from({ length: 118 }, (_, i) => i + 1));
    expect(new Set(ELEMENTS.map((e) => e.symbol)).size).toBe(118);
  });

  // Outside reference: the chemical-elements package (npm), a general-purpose element table.
  it('agrees with chemical-elements on symbol, Z and name for all 118', () => {
    for (const element of ELEMENTS) {
      const reference = referenceElements.find((r) => r.symbol === element.symbol);
      expect(reference, element.symbol).toBeDefined();
      expect([reference?.number, reference?.name]).toEqual([element.z, element.name]);
    }
  });

  // chemical-elements derives its weights from isotopic abundances, IUPAC's conventional values
  // differ from those by up to ~2 parts in 10⁴ (Se, Pb), so this catches slips, not last digits.
  it('has weights within 2 parts in 10⁴ of chemical-elements for every element with a standard weight', () => {
    for (const element of ELEMENTS.filter((e) => !e.massNumberOnly)) {
      const reference = referenceElements.find((r) => r.symbol === element.symbol);
      expect(Math.abs((reference?.mass ?? 0) - element.weight) / element.weight, element.symbol).toBeLessThan(2e-4);
    }
  });

  it.each(IUPAC_2021_ABRIDGED)('%s rounds to the IUPAC 2021 abridged value %f', (symbol, abridged, halfUnit) => {
    expect(Math.abs((elementBySymbol(symbol)?.weight ?? NaN) - abridged)).toBeLessThanOrEqual(halfUnit + 1e-12);
  });

  it.each(CIAAW_REVISIONS)('%s has the CIAAW standard atomic weight %f (looked up)', (symbol, weight) => {
    expect(elementBySymbol(symbol)?.weight).toBe(weight);
  });

  it.each(CIAAW_2021_INTERVALS)('%s carries a conventional value inside its 2021 interval [%f, %f]', (symbol, low, high) => {
    const weight = elementBySymbol(symbol)?.weight ?? NaN;
    expect(weight).toBeGreaterThanOrEqual(low);
    expect(weight).toBeLessThanOrEqual(high);
  });

  it.each(MASS_NUMBERS)('%s carries mass number %i, marked as such', (symbol, massNumber) => {
    expect(elementBySymbol(symbol)).toMatchObject({ weight: massNumber, massNumberOnly: true });
  });

  it('marks exactly the elements without a standard atomic weight (Tc, Pm, Po–Ac, Np–Og)', () => {
    const marked = ELEMENTS.filter((e) => e.massNumberOnly).map((e) => e.z);
    const expected = [43, 61, 84, 85, 86, 87, 88, 89, ...Array.from({ length: 26 }, (_, i) => 93 + i)];
    expect(marked).toEqual(expected);
  });
});

describe('elementBySymbol', () => {
  it('is case-sensitive: Co is cobalt, CO and co are not symbols', () => {
    expect(elementBySymbol('Co')?.name).toBe('Cobalt');
    expect(elementBySymbol('CO')).toBeUndefined();
    expect(elementBySymbol('co')).toBeUndefined();
  });
});

describe('molarMass', () => {
  // Values from the conventional atomic weights above (common practice): H2O 18.015, CO2 44.009, O3 47.997.
  it.each([
    [{ H: 2, O: 1 }, 18.015],
    [{ C: 1, O: 2 }, 44.009],
    [{ O: 3 }, 47.997],
    [{ Na: 1, Cl: 1 }, 58.44],
  ])('of %o is %f g/mol', (composition, expected) => {
    expect(molarMass(composition)).toBeCloseTo(expected, 2);
  });

  it('rejects an unknown symbol and a negative count, naming them', () => {
    expect(() => molarMass({ Xx: 1 })).toThrow('unknown element symbol "Xx"');
    expect(() => molarMass({ O: -1 })).toThrow('count of O must be a finite number ≥ 0, got -1');
  });
});
