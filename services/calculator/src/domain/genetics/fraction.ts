/**
 * Exact rational numbers for genetic probabilities. Floating point cannot represent 1/3 or 1/10,
 * and a table of outcomes must add up to exactly 1, so every probability is a reduced bigint ratio.
 */
export interface Fraction {
  /** Carries the sign. */
  readonly num: bigint;
  /** Always positive; gcd(num, den) is 1. */
  readonly den: bigint;
}

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function toBigInt(value: bigint | number, what: string): bigint {
  if (typeof value === 'bigint') return value;
  // A non-integer or unsafe number would already have lost precision before it reached us.
  if (!Number.isSafeInteger(value)) throw new RangeError(`${what} must be a safe integer, got ${value}`);
  return BigInt(value);
}

export function fraction(num: bigint | number, den: bigint | number = 1n): Fraction {
  let n = toBigInt(num, 'numerator');
  let d = toBigInt(den, 'denominator');
  if (d === 0n) throw new RangeError('denominator must not be zero');
  if (d < 0n) [n, d] = [-n, -d];
  const g = gcd(n, d);
  return g > 1n ? { num: n / g, den: d / g } : { num: n, den: d };
}

export const ZERO = fraction(0);
export const ONE = fraction(1);

export const add = (a: Fraction, b: Fraction): Fraction => fraction(a.num * b.den + b.num * a.den, a.den * b.den);
export const subtract = (a: Fraction, b: Fraction): Fraction => fraction(a.num * b.den - b.num * a.den, a.den * b.den);
export const multiply = (a: Fraction, b: Fraction): Fraction => fraction(a.num * b.num, a.den * b.den);

export function divide(a: Fraction, b: Fraction): Fraction {
  if (b.num === 0n) throw new RangeError('division by zero');
  return fraction(a.num * b.den, a.den * b.num);
}

export const sum = (values: Iterable<Fraction>): Fraction => {
  let total = ZERO;
  for (const v of values) total = add(total, v);
  return total;
};

/** Negative, zero or positive as a is less than, equal to or greater than b. */
export function compare(a: Fraction, b: Fraction): number {
  const lhs = a.num * b.den;
  const rhs = b.num * a.den;
  return lhs < rhs ? -1 : lhs > rhs ? 1 : 0;
}

export const equals = (a: Fraction, b: Fraction): boolean => a.num === b.num && a.den === b.den;
export const isZero = (a: Fraction): boolean => a.num === 0n;

/** Always "numerator/denominator", reduced (1 is "1/1"), so clients parse one form. */
export const formatFraction = (a: Fraction): string => `${a.num}/${a.den}`;

export const toNumber = (a: Fraction): number => Number(a.num) / Number(a.den);

/** Rounded half away from zero to `decimals` places, computed exactly before the one conversion to a float. */
export function roundTo(a: Fraction, decimals: number): number {
  const scale = 10n ** BigInt(decimals);
  const scaled = a.num * scale;
  const negative = scaled < 0n;
  const magnitude = negative ? -scaled : scaled;
  const rounded = (2n * magnitude + a.den) / (2n * a.den);
  return Number(negative ? -rounded : rounded) / Number(scale);
}

/**
 * The decimal a person wrote, exactly: 0.1 becomes 1/10, not the nearest binary float. JavaScript's
 * shortest round-trip form of a number is the decimal that was parsed, so it is read from its string.
 */
export function fromDecimal(value: number): Fraction {
  if (!Number.isFinite(value)) throw new RangeError(`not a finite number: ${value}`);
  const match = /^(-?)(\d+)(?:\.(\d+))?(?:e([+-]?\d+))?$/.exec(String(value));
  if (!match) throw new RangeError(`cannot read ${value} as a decimal`);
  const [, sign, whole, frac = '', exp = '0'] = match;
  const digits = BigInt(`${sign}${whole}${frac}`);
  const power = Number(exp) - frac.length;
  return power >= 0 ? fraction(digits * 10n ** BigInt(power)) : fraction(digits, 10n ** BigInt(-power));
}
