/** Greatest common divisor of two BigInts (always ≥ 0). */
export function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** Least common multiple of two positive BigInts. */
export function lcm(a: bigint, b: bigint): bigint {
  return a === 0n || b === 0n ? 0n : (a / gcd(a, b)) * b;
}

/**
 * An exact rational number p/q on BigInt, always reduced with q > 0. Stoichiometry never
 * touches floating point: coefficients such as `1/2` or `0.35` stay exact.
 */
export class Fraction {
  readonly num: bigint;
  readonly den: bigint;
  // A fraction never changes, and a mechanism shows the same few coefficients on every step:
  // its number and text are computed once (private fields stay out of equality checks).
  #number: number | undefined;
  #text: string | undefined;
  // Comparing BigInts is a call into the runtime; the per-step checks ask "whole?" of every term.
  #whole: boolean | undefined;

  constructor(num: bigint, den: bigint = 1n) {
    if (den === 0n) throw new RangeError('Fraction: zero denominator');
    const sign = den < 0n ? -1n : 1n;
    const divisor = gcd(num, den) || 1n;
    this.num = (sign * num) / divisor;
    this.den = (sign * den) / divisor;
  }

  static readonly ZERO = new Fraction(0n);
  static readonly ONE = new Fraction(1n);

  static of(value: number | bigint): Fraction {
    if (typeof value === 'bigint') return new Fraction(value);
    if (!Number.isInteger(value)) throw new RangeError(`Fraction.of: ${value} is not an integer`);
    return new Fraction(BigInt(value));
  }

  /** Reads `3`, `0.35` or `1/2` exactly; null when the text is not such a number. */
  static parse(text: string): Fraction | null {
    const ratio = /^(\d+)\/(\d+)$/.exec(text);
    if (ratio) return BigInt(ratio[2]) === 0n ? null : new Fraction(BigInt(ratio[1]), BigInt(ratio[2]));
    const decimal = /^(\d+)(?:\.(\d+))?$/.exec(text);
    if (!decimal) return null;
    const digits = decimal[2] ?? '';
    return new Fraction(BigInt(decimal[1] + digits), 10n ** BigInt(digits.length));
  }

  add(other: Fraction): Fraction {
    if (this.den === other.den) return new Fraction(this.num + other.num, this.den);
    return new Fraction(this.num * other.den + other.num * this.den, this.den * other.den);
  }

  sub(other: Fraction): Fraction {
    return this.add(other.neg());
  }

  mul(other: Fraction): Fraction {
    return new Fraction(this.num * other.num, this.den * other.den);
  }

  div(other: Fraction): Fraction {
    return new Fraction(this.num * other.den, this.den * other.num);
  }

  neg(): Fraction {
    return new Fraction(-this.num, this.den);
  }

  isZero(): boolean {
    return this.num === 0n;
  }

  isInteger(): boolean {
    if (this.#whole === undefined) this.#whole = this.den === 1n;
    return this.#whole;
  }

  sign(): number {
    return this.num > 0n ? 1 : this.num < 0n ? -1 : 0;
  }

  equals(other: Fraction): boolean {
    return this === other || (this.num === other.num && this.den === other.den);
  }

  toNumber(): number {
    if (this.#number === undefined) this.#number = Number(this.num) / Number(this.den);
    return this.#number;
  }

  /** `3`, `-1/2`. */
  toString(): string {
    if (this.#text === undefined) this.#text = this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
    return this.#text;
  }
}
