import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import ChemEquation from '@web/components/equation/ChemEquation.vue';
import { equationPieces, speciesPieces } from '@web/components/equation/chemTokens';

// Typesetting conventions of chemical formulae (IUPAC Red Book: counts as subscripts, charges as
// superscripts with the number before the sign; the radical dot beside the symbol) — common practice.
describe('speciesPieces', () => {
  it('sets element counts as subscripts', () => {
    expect(speciesPieces('H2O2')).toEqual([
      { kind: 'text', text: 'H' }, { kind: 'sub', text: '2' }, { kind: 'text', text: 'O' }, { kind: 'sub', text: '2' },
    ]);
  });

  it('sets group counts after a bracket as subscripts', () => {
    expect(speciesPieces('(CH3)3COH').filter((piece) => piece.kind === 'sub').map((piece) => piece.text)).toEqual(['3', '3']);
  });

  it('writes a charge as a superscript, number before the sign, with a true minus', () => {
    expect(speciesPieces('SO4^2-')).toContainEqual({ kind: 'sup', text: '2−' });
    expect(speciesPieces('Fe^3+')).toEqual([{ kind: 'text', text: 'Fe' }, { kind: 'sup', text: '3+' }]);
    expect(speciesPieces('e^-')).toEqual([{ kind: 'text', text: 'e' }, { kind: 'sup', text: '−' }]);
  });

  it('turns an ASCII radical mark into the radical dot', () => {
    expect(speciesPieces('Br.')).toEqual([{ kind: 'text', text: 'Br' }, { kind: 'radical', text: '•' }]);
    expect(speciesPieces('NO2•')).toContainEqual({ kind: 'radical', text: '•' });
  });

  it('keeps state tags whole: the digits of O(1D) are not counts', () => {
    expect(speciesPieces('O(1D)')).toEqual([{ kind: 'text', text: 'O' }, { kind: 'state', text: '(1D)' }]);
    expect(speciesPieces('O2(a1Δg)')).toContainEqual({ kind: 'state', text: '(a1Δg)' });
  });

  it('sets the sites of an adsorbed species as a subscript after the mark', () => {
    expect(speciesPieces('CO*2')).toEqual([{ kind: 'text', text: 'CO*' }, { kind: 'sub', text: '2' }]);
  });
});

describe('equationPieces', () => {
  it('replaces ASCII arrows with → and ⇌', () => {
    expect(equationPieces('A -> B').find((piece) => piece.kind === 'arrow')?.text).toBe('→');
    expect(equationPieces('A <=> B').find((piece) => piece.kind === 'arrow')?.text).toBe('⇌');
    expect(equationPieces('A ⇌ B').find((piece) => piece.kind === 'arrow')?.text).toBe('⇌');
  });

  it('reads coefficients, fractions included, and keeps a charge + apart from the term separator', () => {
    const pieces = equationPieces('2 H^+ + 1/2 O2 -> H2O^2+');
    expect(pieces.filter((piece) => piece.kind === 'coefficient').map((piece) => piece.text)).toEqual(['2', '1/2']);
    expect(pieces.filter((piece) => piece.kind === 'plus')).toHaveLength(1);
    expect(pieces.filter((piece) => piece.kind === 'sup').map((piece) => piece.text)).toEqual(['+', '2+']);
  });
});

describe('ChemEquation', () => {
  it('renders the bromine cycle step with subscripts, dots and a proper arrow, readable as text', () => {
    const wrapper = mount(ChemEquation, { props: { equation: '2 BrO. -> 2 Br• + O2' } });
    expect(wrapper.findAll('sub').map((node) => node.text())).toEqual(['2']);
    expect(wrapper.findAll('.chem-equation__radical')).toHaveLength(2);
    expect(wrapper.text().replace(/\s+/g, ' ')).toBe('2 BrO• → 2 Br• + O2');
  });

  it('renders charges as superscripts', () => {
    const wrapper = mount(ChemEquation, { props: { equation: 'H2O2 + I^- -> H2O + IO^-' } });
    expect(wrapper.findAll('sup').map((node) => node.text())).toEqual(['−', '−']);
  });
});
