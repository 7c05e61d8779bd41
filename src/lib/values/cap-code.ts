/**
 * `capacitorCode(farads) → string | undefined` and `parseCapacitorCode(text) → Result<…>`
 *
 * The three-digit capacitor mark (EIA convention, check-values.md §1c [S]): value in pF =
 * first two digits × 10^(third digit), with third digit 8 → ×0.01 and 9 → ×0.1 (most
 * tables; one vendor note reads 10⁸/10⁹, §13.2). A bare two-digit mark is pF ("47").
 * An optional IEC tolerance letter follows ("473J" = 47 nF ±5 %, §1b).
 * Our writing rule: always three digits, since both "47" and "470" mean 47 pF but only the
 * three-digit form has one shape for every value — 47 pF → "470", 22 pF → "220",
 * 4.7 pF → "479", 100 nF → "104". Written range 0.1 pF (…8) to 990 µF (…7); undefined
 * when the value needs more than two significant digits or lies outside that range.
 * Reading accepts third digits 0–9. Problem codes: value.empty, value.syntax.
 */
import { fail, ok, type Result } from '../model/problem.ts';
import { scaled, toDecimal } from './decimal.ts';
import { quoted, valueProblem } from './problem.ts';
import { toleranceOfLetter, type Tolerance } from './tolerance.ts';

/** Third digit → power of ten on pF. */
function digitExp(d: number): number {
  return d === 8 ? -2 : d === 9 ? -1 : d;
}

export function capacitorCode(farads: number): string | undefined {
  if (!Number.isFinite(farads) || farads <= 0) return undefined;
  const d = toDecimal(farads);
  if (d.digits.length > 2) return undefined;
  const pfExp = d.exp + 12 - 1; // power of ten on the two-digit significand, in pF
  if (pfExp < -2 || pfExp > 7) return undefined;
  const third = pfExp === -2 ? 8 : pfExp === -1 ? 9 : pfExp;
  return `${d.digits.padEnd(2, '0')}${third}`;
}

export function parseCapacitorCode(text: string): Result<{ farads: number; tolerance?: Tolerance }> {
  if (typeof text !== 'string' || text.trim() === '') {
    return fail([valueProblem('value.empty', '', 'the capacitor mark is empty', 'write the printed code, e.g. 104 or 473J')]);
  }
  const t = text.trim();
  const m = /^(\d\d)(\d?)\s*([A-Z]?)$/.exec(t);
  const tolerance = m?.[3] ? toleranceOfLetter(m[3]) : undefined;
  if (!m || (m[3] && !tolerance)) {
    return fail([valueProblem('value.syntax', t, `${quoted(t)} is not a capacitor code`, 'a code is two or three digits and an optional tolerance letter, e.g. 104 or 473J')]);
  }
  const third = m[2] === '' || m[2] === undefined ? 0 : digitExp(Number(m[2]));
  const farads = scaled(Number(m[1]), third - 12);
  return ok({ farads, ...(tolerance ? { tolerance } : {}) });
}
