/**
 * `formatValue(value, quantity) → string` and `formatSi(value, unit) → string`
 *
 * `formatValue` writes the IEC 60062 letter-and-digit form: the multiplier letter stands
 * where the decimal point goes and trailing zeros are dropped — 4700 Ω → "4k7", 2.2 Ω →
 * "2R2", 470 Ω → "470R", 1e6 Ω → "1M", 0.47 Ω → "R47", 1e-7 F → "100n", 1e-6 F → "1u",
 * 4.7e-12 F → "4p7", 0.68 pF → "p68". The letter is chosen so the digits before it are
 * 1…999 (except 0.1…1 Ω, written "R47" as is customary); resistance uses L R k M G T,
 * capacitance p n u m F, inductance p n u m H, voltage u m V k M ("3V3"). Zero is "0R",
 * "0F", "0H", "0V". Up to 15 significant digits are kept, so `parseValue` gives the value
 * back. `formatSi` writes the SI form with a space: 4700, "Ω" → "4.7 kΩ"; 1e-7, "F" →
 * "100 nF" (prefixes p … T, µ as U+00B5). Non-finite numbers come back as `String(value)`.
 */
import { splitAt, toDecimal } from './decimal.ts';
import { SI_WRITE, WRITE } from './letters.ts';
import type { Quantity } from './quantity.ts';

/** The entry whose exponent is the largest multiple not above the value's decade. */
function pick(letters: readonly (readonly [string, number])[], exp10: number): readonly [string, number] {
  let chosen = letters[0];
  for (const entry of letters) if (entry[1] <= exp10) chosen = entry;
  if (!chosen) throw new Error('empty letter table');
  return chosen;
}

export function formatValue(value: number, quantity: Quantity): string {
  if (!Number.isFinite(value)) return String(value);
  const letters = WRITE[quantity];
  const unitEntry = letters.find(([, e]) => e === 0);
  if (!unitEntry) throw new Error(`no unit letter for ${quantity}`);
  const d = toDecimal(value);
  if (d.digits === '0') return `0${unitEntry[0]}`;
  // 0.1…1 Ω reads "R47" in the trade rather than "470L" [P].
  const [letter, exp] = quantity === 'resistance' && d.exp === -1 ? unitEntry : pick(letters, d.exp);
  const { int, frac } = splitAt(d, exp);
  return `${d.negative ? '-' : ''}${int}${letter}${frac}`;
}

export function formatSi(value: number, unit: string): string {
  if (!Number.isFinite(value)) return String(value);
  const d = toDecimal(value);
  if (d.digits === '0') return `0 ${unit}`;
  const [prefix, exp] = pick(SI_WRITE, d.exp);
  const { int, frac } = splitAt(d, exp);
  return `${d.negative ? '-' : ''}${int || '0'}${frac ? `.${frac}` : ''} ${prefix}${unit}`;
}
