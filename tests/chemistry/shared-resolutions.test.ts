import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';

// Spellings resolved in one analysis are kept for the next (species-registry.ts); these checks
// make sure that what is kept never leaks a meaning from one text into another.
describe('species resolutions kept between analyses', () => {
  const undeclared = 'E1: Enz + S -> Enz + P\n';
  const declared = '%species Enz\n%species S = C6H12O6\n%species P = C6H12O6\nE1: Enz + S -> Enz + P\n';

  it('an undeclared name stays an error after a text that declared it, and the other way round', () => {
    const codes = (text: string) => analyseMechanism(text).diagnostics.map((d) => d.code);
    expect(codes(declared)).not.toContain('undeclared-name');
    expect(codes(undeclared)).toContain('undeclared-name');
    expect(codes(declared)).not.toContain('undeclared-name');
    expect(codes(undeclared)).toContain('undeclared-name');
  });

  it('the same text gives the same analysis twice, problems placed on each line where they occur', () => {
    const text = 'A1: NO + O3 -> NO2 + O2\nA2: Xq2 + O3 -> O2 + O2\nA3: Xq2 + NO -> NO2\n';
    const first = analyseMechanism(text);
    const second = analyseMechanism(text);
    expect(second).toEqual(first);
    // Xq is not an element symbol (IUPAC): reported on both lines that write it, in both runs.
    const unknown = second.diagnostics.filter((d) => d.code === 'unknown-element').map((d) => [d.line, d.column]);
    expect(unknown).toEqual([[2, 5], [3, 5]]);
  });

  it('a species listed in one text is a fresh record in the next (its first line is its own)', () => {
    const a = analyseMechanism('R1: O3 + hν -> O2 + O(1D)\n');
    const b = analyseMechanism('# a comment first\n\nR1: O3 + hν -> O2 + O(1D)\n');
    expect(a.species.find((s) => s.key === 'O3')?.firstLine).toBe(1);
    expect(b.species.find((s) => s.key === 'O3')?.firstLine).toBe(3);
  });
});
