/**
 * Tolerance letters of the IEC 60062 letter-and-digit code (check-values.md §1b [S]):
 * B ±0.1, C ±0.25, D ±0.5, F ±1, G ±2, J ±5, K ±10, M ±20 %, Z +80/−20 % (capacitors).
 */
export interface Tolerance {
  /** IEC letter, when the tolerance has one. */
  letter?: string;
  /** Percent above and below nominal (both positive). */
  plusPct: number;
  minusPct: number;
}

function even(letter: string, pct: number): Tolerance {
  return { letter, plusPct: pct, minusPct: pct };
}

export const TOLERANCE_LETTERS: Readonly<Record<string, Tolerance>> = {
  B: even('B', 0.1),
  C: even('C', 0.25),
  D: even('D', 0.5),
  F: even('F', 1),
  G: even('G', 2),
  J: even('J', 5),
  K: even('K', 10),
  M: even('M', 20),
  Z: { letter: 'Z', plusPct: 80, minusPct: 20 },
};

export function toleranceOfLetter(letter: string): Tolerance | undefined {
  return Object.hasOwn(TOLERANCE_LETTERS, letter) ? TOLERANCE_LETTERS[letter] : undefined;
}
