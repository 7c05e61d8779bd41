/**
 * Preferred number series of IEC 60063 (check-values.md §2 [S]).
 *
 * `E_SERIES[name]` holds the significands of one decade as integers: E6/E12/E24 in tenths
 * (10 … 91), E96 in hundredths (100 … 976). E24 is written out because it does not follow
 * round(10·10^(i/24)) (2.7 … 4.7 and 8.2 differ); E12 and E6 are every second E24 and E12
 * value. `nearestPreferred(value, series)` returns the series value nearest on a log
 * scale, looking across decade edges (9.6 → 10 in E24), built exactly (4.7e-12, not
 * 4.700000000000001e-12); undefined for values that are not finite and positive.
 * `isPreferred(value, series)` is true when the value is a series value times a power of
 * ten (relative tolerance 1e-9).
 */
import { scaled, toDecimal } from './decimal.ts';

export const SERIES_NAMES = ['E6', 'E12', 'E24', 'E96'] as const;
export type SeriesName = (typeof SERIES_NAMES)[number];

// check-values.md §2: IEC 60063 E24 table [S].
const E24 = [10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91] as const;
// check-values.md §2: IEC 60063 E96 table [S].
const E96 = [
  100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162, 165, 169, 174,
  178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294, 301, 309,
  316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511, 523, 536, 549,
  562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976,
] as const;
const E12 = E24.filter((_, i) => i % 2 === 0);
const E6 = E12.filter((_, i) => i % 2 === 0);

export const E_SERIES: Readonly<Record<SeriesName, readonly number[]>> = { E6, E12, E24, E96 };

/** Digits in each significand: 2 for E6…E24, 3 for E96. */
function places(series: SeriesName): number {
  return series === 'E96' ? 3 : 2;
}

/** Series values in the decades around `value`, smallest first. */
function candidates(value: number, series: SeriesName): number[] {
  const decade = toDecimal(value).exp;
  const out: number[] = [];
  for (let d = decade - 1; d <= decade + 1; d += 1) {
    for (const s of E_SERIES[series]) out.push(scaled(s, d - places(series) + 1));
  }
  return out;
}

export function nearestPreferred(value: number, series: SeriesName): number | undefined {
  if (!Number.isFinite(value) || value <= 0) return undefined;
  let best: number | undefined;
  let bestDist = Infinity;
  for (const c of candidates(value, series)) {
    const dist = Math.abs(Math.log(c / value));
    if (dist < bestDist) {
      best = c;
      bestDist = dist;
    }
  }
  return best;
}

export function isPreferred(value: number, series: SeriesName): boolean {
  const n = nearestPreferred(value, series);
  return n !== undefined && Math.abs(n - value) <= 1e-9 * value;
}
