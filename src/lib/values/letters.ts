/**
 * Multiplier letters per quantity. Reading follows IEC 60062 clause 4 (check-values.md §1b
 * [S]): resistance L R K M G T, capacitance p n µ m F; case matters for M/m. The ASCII "u"
 * for µ, lowercase "k", "r", uppercase "N"/"P"/"U" are common practice [P]. Inductance and
 * voltage borrow the same idea with H and V as the unit letter ("4u7", "3V3") [P].
 */
import type { Quantity } from './quantity.ts';

/** Letters that read the same for every quantity that accepts them, with their exponent. */
const READ: Readonly<Record<Quantity, Readonly<Record<string, number>>>> = {
  resistance: { L: -3, R: 0, r: 0, K: 3, k: 3, M: 6, G: 9, T: 12, meg: 6 },
  capacitance: { p: -12, P: -12, n: -9, N: -9, u: -6, U: -6, µ: -6, m: -3, F: 0 },
  inductance: { p: -12, P: -12, n: -9, N: -9, u: -6, U: -6, µ: -6, m: -3, H: 0 },
  voltage: { u: -6, U: -6, µ: -6, m: -3, V: 0, k: 3, K: 3, M: 6, meg: 6 },
};

/** SI prefixes also read for resistance once an Ω (or "ohm") is written: 1 mΩ, 10 µΩ. */
const RESISTANCE_WITH_UNIT: Readonly<Record<string, number>> = { m: -3, u: -6, U: -6, µ: -6 };

/** Which quantity a letter points to when no hint or unit says otherwise. */
const IMPLIES: Readonly<Record<string, Quantity>> = {
  L: 'resistance', R: 'resistance', r: 'resistance', K: 'resistance', k: 'resistance',
  M: 'resistance', G: 'resistance', T: 'resistance', meg: 'resistance',
  p: 'capacitance', P: 'capacitance', n: 'capacitance', N: 'capacitance', u: 'capacitance',
  U: 'capacitance', µ: 'capacitance', m: 'capacitance', F: 'capacitance',
  H: 'inductance',
  V: 'voltage',
};

/** Letters that are themselves the unit (×1), so they fix the quantity. */
const UNIT_LETTER: Readonly<Record<string, Quantity>> = { R: 'resistance', r: 'resistance', F: 'capacitance', H: 'inductance', V: 'voltage' };

export function isMultiplierLetter(s: string): boolean {
  return Object.hasOwn(IMPLIES, s);
}

export function impliedQuantity(letter: string): Quantity | undefined {
  return Object.hasOwn(IMPLIES, letter) ? IMPLIES[letter] : undefined;
}

export function unitLetterQuantity(letter: string): Quantity | undefined {
  return Object.hasOwn(UNIT_LETTER, letter) ? UNIT_LETTER[letter] : undefined;
}

/**
 * Exponent of `letter` for `q`: a number, 'ambiguous' when the case rule forbids a guess
 * (m without Ω for resistance; M for capacitance or inductance, which old marks used for
 * micro), or undefined when the letter belongs to another quantity.
 */
export function letterExponent(q: Quantity, letter: string, unitWritten: boolean): number | 'ambiguous' | undefined {
  const table = READ[q];
  if (Object.hasOwn(table, letter)) return table[letter];
  if (q === 'resistance' && unitWritten && Object.hasOwn(RESISTANCE_WITH_UNIT, letter)) return RESISTANCE_WITH_UNIT[letter];
  if (q === 'resistance' && letter === 'm') return 'ambiguous';
  if ((q === 'capacitance' || q === 'inductance') && letter === 'M') return 'ambiguous';
  return undefined;
}

/** Letters written by `formatValue`, ascending by exponent; the ×1 letter doubles as unit. */
export const WRITE: Readonly<Record<Quantity, readonly (readonly [string, number])[]>> = {
  resistance: [['L', -3], ['R', 0], ['k', 3], ['M', 6], ['G', 9], ['T', 12]],
  capacitance: [['p', -12], ['n', -9], ['u', -6], ['m', -3], ['F', 0]],
  inductance: [['p', -12], ['n', -9], ['u', -6], ['m', -3], ['H', 0]],
  voltage: [['u', -6], ['m', -3], ['V', 0], ['k', 3], ['M', 6]],
};

/** SI prefixes written by `formatSi` (µ is U+00B5). */
export const SI_WRITE: readonly (readonly [string, number])[] = [
  ['p', -12], ['n', -9], ['µ', -6], ['m', -3], ['', 0],
  ['k', 3], ['M', 6], ['G', 9], ['T', 12],
];
