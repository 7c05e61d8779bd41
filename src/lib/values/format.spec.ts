import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatSi, formatValue } from './format.ts';
import { parseValue } from './parse.ts';
import type { Quantity } from './quantity.ts';

describe('formatValue', () => {
  // check-values.md §1b: IEC 60062 letter-and-digit code [S]; the letter stands for the point
  it.each([
    [4700, 'resistance', '4k7'],
    [2.2, 'resistance', '2R2'],
    [1e6, 'resistance', '1M'],
    [4.7e6, 'resistance', '4M7'],
    [47300, 'resistance', '47k3'],
    [0.47, 'resistance', 'R47'],
    [470, 'resistance', '470R'],
    [1e-7, 'capacitance', '100n'],
    [4.7e-12, 'capacitance', '4p7'],
    [4.7e-9, 'capacitance', '4n7'],
    [1e-6, 'capacitance', '1u'],
    [2.2e-3, 'capacitance', '2m2'],
    [0.68e-12, 'capacitance', 'p68'],
  ] as const)('%d (%s) → %s', (value, q, text) => {
    expect(formatValue(value, q)).toBe(text);
  });

  it('writes other quantities, zero and float noise sensibly', () => {
    expect(formatValue(3.3, 'voltage')).toBe('3V3');
    expect(formatValue(4.7e-6, 'inductance')).toBe('4u7');
    expect(formatValue(0, 'resistance')).toBe('0R');
    expect(formatValue(0.1 + 0.2, 'resistance')).toBe('R3');
    expect(formatValue(4.7e-3, 'resistance')).toBe('4L7');
    expect(formatValue(1e10, 'resistance')).toBe('10G');
    expect(formatValue(Number.NaN, 'resistance')).toBe('NaN');
  });
});

describe('formatSi', () => {
  it.each([
    [4700, 'Ω', '4.7 kΩ'],
    [1e-7, 'F', '100 nF'],
    [1e-5, 'F', '10 µF'],
    [2.2, 'Ω', '2.2 Ω'],
    [0.68e-12, 'F', '0.68 pF'],
    [9, 'V', '9 V'],
    [0, 'F', '0 F'],
  ] as const)('%d %s → %s', (value, unit, text) => {
    expect(formatSi(value, unit)).toBe(text);
  });
});

/** Log-uniform values from 10^lo to 10^hi. */
const logUniform = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true }).map((x) => 10 ** x);

function backAgain(text: string, q: Quantity): number {
  const r = parseValue(text, q);
  if (!r.ok) throw new Error(`${text}: ${r.problems[0]?.code}`);
  return r.value.value;
}

describe('format → parse round trip', () => {
  const cases: [Quantity, string, number, number][] = [
    ['resistance', 'Ω', -3, 10], // 1 mΩ … 10 GΩ
    ['capacitance', 'F', -13, 0], // 0.1 pF … 1 F
  ];
  for (const [q, unit, lo, hi] of cases) {
    it(`letter form gives the ${q} back`, () => {
      fc.assert(
        fc.property(logUniform(lo, hi), (v) => {
          expect(Math.abs(backAgain(formatValue(v, q), q) - v)).toBeLessThanOrEqual(1e-12 * v);
        }),
        { numRuns: 2000 },
      );
    });
    it(`SI form gives the ${q} back`, () => {
      fc.assert(
        fc.property(logUniform(lo, hi), (v) => {
          expect(Math.abs(backAgain(formatSi(v, unit), q) - v)).toBeLessThanOrEqual(1e-12 * v);
        }),
        { numRuns: 2000 },
      );
    });
  }

  it('is exact for three-digit values', () => {
    fc.assert(
      fc.property(fc.integer({ min: 100, max: 999 }), fc.integer({ min: -14, max: 9 }), fc.constantFrom<Quantity>('resistance', 'capacitance'), (m, e, q) => {
        const v = Number(`${m}e${e}`);
        expect(backAgain(formatValue(v, q), q)).toBe(v);
      }),
      { numRuns: 1000 },
    );
  });
});
