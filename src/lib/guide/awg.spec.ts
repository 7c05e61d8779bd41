import { describe, expect, it } from 'vitest';
import { awgDiameterMm, linkWire } from './awg.ts';

describe('solid wire gauge', () => {
  it('matches the ASTM B258 table values', () => {
    // check-values §11: formula gives 0.8118 / 0.6438 / 0.5106 / 0.4049 mm; tables ±0.002 mm
    expect(awgDiameterMm(20)).toBeCloseTo(0.8118, 3);
    expect(awgDiameterMm(22)).toBeCloseTo(0.6438, 3);
    expect(awgDiameterMm(24)).toBeCloseTo(0.5106, 3);
    expect(awgDiameterMm(26)).toBeCloseTo(0.4049, 3);
    // 36 AWG is the formula's anchor: exactly 0.005 in
    expect(awgDiameterMm(36)).toBeCloseTo(0.127, 9);
  });

  it('suggests 22 AWG for a 1.0 mm stripboard hole', () => {
    // check-values §8 hole ≈ 1.0 mm; §11: 22 AWG is the usual link wire, 20 AWG only snug
    const w = linkWire(1.0);
    expect(w.awg).toBe(22);
    expect(w.diameterMm).toBeCloseTo(0.644, 2);
    expect(linkWire(1.2).awg).toBe(20);
    expect(linkWire(0.8).awg).toBe(24);
  });
});
