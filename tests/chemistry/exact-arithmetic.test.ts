import { all, create } from 'mathjs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Fraction } from '@api/chemistry/fraction';
import { nullSpace, rank, type SparseRow } from '@api/chemistry/integer-matrix';

// Outside reference: mathjs with exact Fraction numbers (general-purpose library from npm).
const math = create(all, { number: 'Fraction' });

describe('Fraction', () => {
  it('reads integers, decimals and fractions exactly', () => {
    expect(Fraction.parse('3')?.toString()).toBe('3');
    expect(Fraction.parse('0.35')?.toString()).toBe('7/20');
    expect(Fraction.parse('6/4')?.toString()).toBe('3/2');
    expect(Fraction.parse('1/0')).toBeNull();
    expect(Fraction.parse('1e3')).toBeNull();
  });

  it('adds, multiplies and divides like mathjs fractions', () => {
    const small = fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: 1, max: 50 }));
    fc.assert(
      fc.property(small, small, ([a, b], [c, d]) => {
        const x = new Fraction(BigInt(a), BigInt(b));
        const y = new Fraction(BigInt(c), BigInt(d));
        const mx = math.fraction(a, b);
        const my = math.fraction(c, d);
        expect(x.add(y).toString()).toBe(math.format(math.add(mx, my), { fraction: 'ratio' }).replace(/\/1$/, ''));
        expect(x.mul(y).toString()).toBe(math.format(math.multiply(mx, my), { fraction: 'ratio' }).replace(/\/1$/, ''));
        if (c !== 0) expect(x.div(y).toString()).toBe(math.format(math.divide(mx, my), { fraction: 'ratio' }).replace(/\/1$/, ''));
      }),
      { numRuns: 300 },
    );
  });
});

function rowsOf(matrix: number[][]): SparseRow[] {
  return matrix.map((row) => new Map(row.flatMap((value, column) => (value === 0 ? [] : [[column, BigInt(value)] as [number, bigint]]))));
}

describe('exact null space', () => {
  const matrix = fc.integer({ min: 1, max: 5 }).chain((rows) =>
    fc.integer({ min: 1, max: 7 }).chain((columns) => fc.array(fc.array(fc.integer({ min: -3, max: 3 }), { minLength: columns, maxLength: columns }), { minLength: rows, maxLength: rows })),
  );

  it('gives n − rank independent integer vectors x with A x = 0 (checked with mathjs)', () => {
    fc.assert(
      fc.property(matrix, (a) => {
        const columns = a[0].length;
        const basis = nullSpace(rowsOf(a), columns);
        expect(basis).toHaveLength(columns - rank(rowsOf(a), columns));
        for (const x of basis) {
          const product = math.multiply(math.matrix(a), math.matrix(x.map(Number))) as unknown as { toArray: () => number[] };
          expect(product.toArray().map(Number)).toEqual(a.map(() => 0));
        }
        if (basis.length > 0) expect(rank(rowsOf(basis.map((x) => x.map(Number))), columns)).toBe(basis.length);
      }),
      { numRuns: 300 },
    );
  });

  it('agrees with the determinant: a square matrix has a null space exactly when det = 0 (mathjs)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }).chain((n) => fc.array(fc.array(fc.integer({ min: -3, max: 3 }), { minLength: n, maxLength: n }), { minLength: n, maxLength: n })), (a) => {
        const singular = Number(math.det(math.matrix(a))) === 0;
        expect(nullSpace(rowsOf(a), a.length).length > 0).toBe(singular);
      }),
      { numRuns: 300 },
    );
  });

  it('stays exact when entries outgrow 2^53 (BigInt path)', () => {
    const big = 2n ** 60n;
    const rows: SparseRow[] = [new Map([[0, big], [1, -(big + 1n)]]), new Map([[1, big], [2, -1n]])];
    const [x] = nullSpace(rows, 3);
    expect(x[0] * big - x[1] * (big + 1n)).toBe(0n);
    expect(x[1] * big - x[2]).toBe(0n);
  });
});
