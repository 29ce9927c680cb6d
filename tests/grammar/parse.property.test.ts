import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMechanism } from '@api/chemistry/analyse';
import { parseMechanism } from '@grammar/parse';

// Pieces of the notation, so that random texts come close to real lines and reach deep into the grammar.
const PIECES = ['Br', 'O3', '•', '.', '(', ')', '[', ']', '(3P)', '^2+', '^-', '*', '*2', ' + ', ' -> ', ' ⇌ ', '<=>', ' @ ', '|', '#', 'hν', 'hv', 'M', 'e^-', '1/2', '0.5', '2', ':', 'R1', '%title', '%species', ' = ', ',', '%terminal', '\n', ' '];
const notationLike = fc.array(fc.constantFrom(...PIECES), { maxLength: 40 }).map((pieces) => pieces.join(''));

describe('parser robustness (property-based)', () => {
  it('never throws on arbitrary text, and every diagnostic has a position, code and message', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary', maxLength: 200 }), notationLike), (text) => {
        const parsed = parseMechanism(text);
        for (const item of parsed.diagnostics) {
          expect(item.line).toBeGreaterThanOrEqual(1);
          expect(item.column).toBeGreaterThanOrEqual(1);
          expect(item.code).toMatch(/^[a-z-]+$/);
          expect(item.message).not.toBe('');
        }
      }),
      { numRuns: 1_000 },
    );
  });

  it('never throws in the whole analysis either', () => {
    fc.assert(
      fc.property(notationLike, (text) => {
        expect(() => analyseMechanism(text)).not.toThrow();
      }),
      { numRuns: 300 },
    );
  });

  it('reads every line independently: a faulty line among good ones leaves their steps intact', () => {
    fc.assert(
      fc.property(notationLike.filter((line) => !line.includes('\n')), (noise) => {
        const good = 'G1: Br• + O3 -> BrO• + O2';
        const parsed = parseMechanism(`${good}\n${noise}\n${good.replace('G1', 'G2')}`);
        const labels = parsed.steps.map((step) => step.label?.text);
        expect(labels[0]).toBe('G1');
        expect(labels[labels.length - 1]).toBe('G2');
        expect(parsed.diagnostics.every((item) => item.line === 2)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
