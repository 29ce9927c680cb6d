import fc from 'fast-check';
import { MF } from 'mf-parser';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';

// Element counts against mf-parser, a general molecular-formula library from npm (outside reference).
// Only round brackets: mf-parser reads square brackets as isotope marks. Symbols that mf-parser also
// knows as group abbreviations (Ac, Pr, Bu…) are left out.
const SYMBOLS = ['H', 'B', 'C', 'N', 'O', 'F', 'Na', 'Mg', 'Al', 'Si', 'P', 'S', 'Cl', 'K', 'Ca', 'Ti', 'Mn', 'Fe', 'Co', 'Ni', 'Cu', 'Zn', 'Se', 'Br', 'Rh', 'Pd', 'I', 'Pt', 'Hg', 'Li'];
const count = fc.oneof(fc.constant(''), fc.integer({ min: 2, max: 12 }).map(String));
const atom = fc.tuple(fc.constantFrom(...SYMBOLS), count).map(([symbol, n]) => `${symbol}${n}`);
const group = (inner: fc.Arbitrary<string>) => fc.tuple(fc.array(inner, { minLength: 1, maxLength: 3 }), fc.integer({ min: 2, max: 4 })).map(([parts, n]) => `(${parts.join('')})${n}`);
const formula = fc.array(fc.oneof(atom, atom, group(atom), group(fc.oneof(atom, group(atom)))), { minLength: 1, maxLength: 5 })
  .map((parts) => parts.join(''))
  .filter((text) => /^[A-Z]/.test(text));

function ours(text: string): Record<string, number> {
  const analysis = analyseMechanism(`${text} + hν -> ${text}`);
  expect(analysis.diagnostics.filter((item) => item.severity === 'error')).toEqual([]);
  return analysis.species.find((species) => species.key === text)?.elements ?? {};
}

describe('element counts', () => {
  it('agree with mf-parser on a few hundred generated formulas', () => {
    const samples = fc.sample(formula, { numRuns: 300, seed: 20260412 });
    for (const text of samples) expect(ours(text)).toEqual((new MF(text).getInfo() as { atoms: Record<string, number> }).atoms);
  });

  it.each([
    ['(CH3)3COH', { C: 4, H: 10, O: 1 }],
    ['CH3(CH2)4CH3', { C: 6, H: 14 }],
    ['Ca3(PO4)2', { Ca: 3, P: 2, O: 8 }],
  ])('agree with mf-parser on %s', (text, atoms) => {
    expect(ours(text)).toEqual(atoms);
    expect((new MF(text).getInfo() as { atoms: Record<string, number> }).atoms).toEqual(atoms);
  });
});

describe('counts out of range', () => {
  const errorsOf = (text: string) => analyseMechanism(text).diagnostics.filter((item) => item.severity === 'error');

  it('refuses a count too large to stay exact, at the count', () => {
    const [error] = errorsOf('C9007199254740993 + hν -> C9007199254740993');
    expect(error).toMatchObject({ code: 'bad-count', line: 1, column: 2, found: '9007199254740993' });
    expect(errorsOf('C100000H2 + hν -> C100000H2')).toEqual([]);
  });

  it('refuses nested group counts that multiply beyond what a formula may hold', () => {
    const [error] = errorsOf('((((C1000)1000)1000)1000) + hν -> C');
    expect(error).toMatchObject({ code: 'bad-count', column: 1, found: 'C' });
    expect(error.message).toContain('atoms of C');
  });

  it('refuses a site count of zero or a fraction of a site, and keeps whole ones', () => {
    expect(errorsOf('CO*0 -> CO + *')[0]).toMatchObject({ code: 'bad-count', column: 4, found: '0' });
    expect(errorsOf('O*0.5 -> O + *')[0]).toMatchObject({ code: 'bad-count', column: 3, found: '0.5' });
    expect(errorsOf('CO*2 -> CO + 2 *')).toEqual([]);
  });
});
