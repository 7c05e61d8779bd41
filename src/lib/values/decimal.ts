/**
 * Decimal digit strings, so that values move between text and numbers without float noise:
 * `toDecimal(4.7e-12)` gives digits "47", exponent −12, and `fromDecimal` rebuilds a number
 * through `Number("4.7e-12")`, which is the same double as the literal.
 */

/** value = d₁.d₂d₃… × 10^exp; `digits` has no trailing zeros ("0" for zero). */
export interface Decimal {
  negative: boolean;
  digits: string;
  exp: number;
}

/** Finite `v` rounded to `sig` significant digits (15 hides binary noise such as 0.1 + 0.2). */
export function toDecimal(v: number, sig = 15): Decimal {
  if (v === 0) return { negative: false, digits: '0', exp: 0 };
  const [mant = '0', e = '0'] = Math.abs(v).toExponential(sig - 1).split('e');
  const digits = mant.replace('.', '').replace(/0+$/, '') || '0';
  return { negative: v < 0, digits, exp: Number(e) };
}

/** Integer and fraction digits of |value| / 10^groupExp, e.g. 4.7e3 at 3 → "4", "7". */
export function splitAt(d: Decimal, groupExp: number): { int: string; frac: string } {
  const intLen = d.exp - groupExp + 1;
  if (d.digits === '0') return { int: '0', frac: '' };
  if (intLen >= d.digits.length) return { int: d.digits + '0'.repeat(intLen - d.digits.length), frac: '' };
  if (intLen <= 0) return { int: '', frac: '0'.repeat(-intLen) + d.digits };
  return { int: d.digits.slice(0, intLen), frac: d.digits.slice(intLen) };
}

/** `int.frac × 10^exp` read as one decimal literal (correctly rounded, no float steps). */
export function fromDecimal(int: string, frac: string, exp: number): number {
  return Number(`${int || '0'}.${frac || '0'}e${exp}`);
}

/** Build `significand × 10^exp` exactly as the literal would be (e.g. 47, −13 → 4.7e-12). */
export function scaled(significand: number, exp: number): number {
  return Number(`${significand}e${exp}`);
}
