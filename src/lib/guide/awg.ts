/**
 * Solid wire for links. `awgDiameterMm(n)` is the ASTM B258 formula
 * d(n) = 0.005 in × 92^((36 − n) / 39) (check-values §11), in mm. `linkWire(holeMm)` picks
 * the thickest usual solid gauge (20–26 AWG) that leaves at least `MIN_CLEARANCE_MM` of
 * room in the hole: on the ≈1.0 mm holes of stripboard (check-values §8) that is 22 AWG,
 * the usual link wire (§11); 20 AWG would fit only snugly (0.19 mm).
 */
export const LINK_GAUGES = [20, 22, 24, 26] as const;

/** Room a bare lead wants in its hole to go in easily and take solder (common practice). */
export const MIN_CLEARANCE_MM = 0.25;

/** Hole diameter of stripboard and perfboard: ≈1.0 mm (0.040 in), check-values §8 [P]. */
export const HOLE_MM = 1.0;

export function awgDiameterMm(n: number): number {
  return 0.005 * 25.4 * 92 ** ((36 - n) / 39);
}

export interface WireStock {
  awg: number;
  diameterMm: number;
  holeMm: number;
  clearanceMm: number;
}

export function linkWire(holeMm = HOLE_MM): WireStock {
  for (const awg of LINK_GAUGES) {
    const d = awgDiameterMm(awg);
    if (holeMm - d >= MIN_CLEARANCE_MM) return { awg, diameterMm: d, holeMm, clearanceMm: holeMm - d };
  }
  const awg = 26;
  const d = awgDiameterMm(awg);
  return { awg, diameterMm: d, holeMm, clearanceMm: holeMm - d };
}
